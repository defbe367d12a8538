namespace SwitchTag.Lexicon;

/// <summary>Which alternate names the gazetteer keeps: those written in Latin, Cyrillic, Greek or
/// Hebrew script (the scripts of the narrators' languages it serves), not too long, and not the
/// airport and postal codes GeoNames mixes into its alternate names.</summary>
public static class ScriptFilter
{
    public const int MaxNameLength = 40;

    public static bool Keep(string name) => InKeptScripts(name) && !IsCode(name);

    /// <summary>Has letters, all of them Latin, Cyrillic, Greek or Hebrew, and is not too long.</summary>
    public static bool InKeptScripts(string name)
    {
        if (name.Length is 0 or > MaxNameLength) return false;
        bool anyLetter = false;
        foreach (char c in name)
        {
            if (!char.IsLetter(c)) continue;
            anyLetter = true;
            if (!IsKeptScript(c)) return false;
        }
        return anyLetter;
    }

    /// <summary>"WAW", "LWO": two to four capital ASCII letters are codes, not names.</summary>
    private static bool IsCode(string name) =>
        name.Length is >= 2 and <= 4 && name.All(char.IsAsciiLetterUpper);

    private static bool IsKeptScript(char c) => c switch
    {
        <= '\u024F' => true,                        // Basic Latin, Latin-1, Latin Extended-A and -B
        >= '\u1E00' and <= '\u1EFF' => true,        // Latin Extended Additional (Vietnamese, Welsh...)
        >= '\u0370' and <= '\u03FF' => true,        // Greek and Coptic
        >= '\u1F00' and <= '\u1FFF' => true,        // Greek Extended
        >= '\u0400' and <= '\u052F' => true,        // Cyrillic and Cyrillic Supplement
        >= '\u0590' and <= '\u05FF' => true,        // Hebrew
        >= '\uFB1D' and <= '\uFB4F' => true,        // Hebrew presentation forms
        >= '\u2C60' and <= '\u2C7F' => true,        // Latin Extended-C
        >= '\uA720' and <= '\uA7FF' => true,        // Latin Extended-D
        _ => false,
    };
}
