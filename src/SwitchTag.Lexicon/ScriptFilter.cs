using SwitchTag.Core.Text;

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

    private static bool IsKeptScript(char c) =>
        WritingScripts.Of(c) is WritingScript.Latin or WritingScript.Greek or WritingScript.Cyrillic or WritingScript.Hebrew;
}
