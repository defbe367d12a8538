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
        // A case form is the name and an ending ("Koláře" of Kolář): the letters the two share are compared.
        if (a.Count < b.Count || a.Count - b.Count > CaseEndingLetters || b.Count == 0) return (false, false);
        bool saidOnly = false, nameOnly = false;
        for (int i = 0; i < b.Count; i++)
        {
            if (a[i].Base != b[i].Base) return (false, false);
            if (a[i].Mark != '\0' && b[i].Mark == '\0') saidOnly = true;
            if (b[i].Mark != '\0' && a[i].Mark == '\0') nameOnly = true;
            // Two different accents on one letter ("Kolář" beside Kolār, IN) are two spellings too.
            if (a[i].Mark != '\0' && b[i].Mark != '\0' && a[i].Mark != b[i].Mark) saidOnly = nameOnly = true;
        }
        return (saidOnly, nameOnly);
    }

    /// <summary>Most letters a case ending adds to a name (Polish "-owie", Hungarian "-ben").</summary>
    private const int CaseEndingLetters = 4;

    /// <summary>Letters in canonical decomposition, lower case, each with its first combining mark ('\0'
    /// for none). Marks written interchangeably count as one: cedilla and comma below (Iaşi, Iași),
    /// diaeresis and double acute (Hungarian ö, ő typed for each other).</summary>
    private static List<(char Base, char Mark)> Letters(string text)
    {
        var letters = new List<(char, char)>(text.Length);
        foreach (char c in text.Normalize(NormalizationForm.FormD))
        {
            var category = CharUnicodeInfo.GetUnicodeCategory(c);
            if (category is UnicodeCategory.NonSpacingMark or UnicodeCategory.EnclosingMark)
            {
                if (letters.Count > 0 && letters[^1].Item2 == '\0') letters[^1] = (letters[^1].Item1, Interchangeable(c));
                continue;
            }
            if (char.IsLetter(c)) letters.Add((char.ToLowerInvariant(c), '\0'));
        }
        return letters;
    }

    private static char Interchangeable(char mark) => mark switch
    {
        '\u0326' => '\u0327',
        '\u030B' => '\u0308',
        _ => mark,
    };
}
