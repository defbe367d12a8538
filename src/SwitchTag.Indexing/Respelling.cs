using System.Globalization;
using System.Text;

namespace SwitchTag.Indexing;

/// <summary>Whether a name as said and a gazetteer name are the same letters with accents on
/// different letters ("Perón" and "Péron"): each carries a mark the other lacks. Folding makes them
/// one key, but a writer who put an accent where the place has none, and none where it has one, wrote
/// another name (Perón is a person; Péron a French village). A name written without any accents
/// ("Krakow", "Bras") or with only the place's own ("Rīga" beside "Riga") is no conflict.</summary>
internal static class Respelling
{
    public static bool MarksConflict(string said, string name) => Compare(said, name) is (true, true);

    /// <summary>Whether the name said carries accents the gazetteer name lacks and none the other way
    /// ("Brás" beside Bras, FR): a writer who accents a name knows its spelling, so a place spelt
    /// plainly is likely another place. Weak evidence, so the caller applies it to villages only.</summary>
    public static bool MarksAdded(string said, string name) => Compare(said, name) is (true, false);

    private static (bool SaidOnly, bool NameOnly) Compare(string said, string name)
    {
        var a = Letters(said);
        var b = Letters(name);
        if (a.Count != b.Count || a.Count == 0) return (false, false);
        bool saidOnly = false, nameOnly = false;
        for (int i = 0; i < a.Count; i++)
        {
            if (a[i].Base != b[i].Base) return (false, false);
            if (a[i].Marked && !b[i].Marked) saidOnly = true;
            if (b[i].Marked && !a[i].Marked) nameOnly = true;
        }
        return (saidOnly, nameOnly);
    }

    /// <summary>Letters in canonical decomposition, lower case, each with whether a combining mark follows.</summary>
    private static List<(char Base, bool Marked)> Letters(string text)
    {
        var letters = new List<(char, bool)>(text.Length);
        foreach (char c in text.Normalize(NormalizationForm.FormD))
        {
            var category = CharUnicodeInfo.GetUnicodeCategory(c);
            if (category is UnicodeCategory.NonSpacingMark or UnicodeCategory.EnclosingMark)
            {
                if (letters.Count > 0) letters[^1] = (letters[^1].Item1, true);
                continue;
            }
            if (char.IsLetter(c)) letters.Add((char.ToLowerInvariant(c), false));
        }
        return letters;
    }
}
