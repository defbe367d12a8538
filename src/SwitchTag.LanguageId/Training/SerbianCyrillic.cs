using System.Text;

namespace SwitchTag.LanguageId.Training;

/// <summary>The standard one-to-one mapping of Serbian Latin (Gaj) to Serbian Cyrillic (Vuk): the
/// digraphs lj, nj, dž are single Cyrillic letters. Used to give the model Cyrillic Serbian text.</summary>
public static class SerbianCyrillic
{
    private static readonly Dictionary<string, string> Digraphs = new(StringComparer.Ordinal)
    {
        ["lj"] = "љ", ["Lj"] = "Љ", ["LJ"] = "Љ", ["nj"] = "њ", ["Nj"] = "Њ", ["NJ"] = "Њ",
        ["dž"] = "џ", ["Dž"] = "Џ", ["DŽ"] = "Џ",
    };

    private static readonly Dictionary<char, char> Letters = Build(
        "abvgdđežzijklmnoprstćufhcčš", "абвгдђежзијклмнопрстћуфхцчш");

    private static Dictionary<char, char> Build(string latin, string cyrillic)
    {
        var map = new Dictionary<char, char>();
        for (int i = 0; i < latin.Length; i++)
        {
            map[latin[i]] = cyrillic[i];
            map[char.ToUpperInvariant(latin[i])] = char.ToUpperInvariant(cyrillic[i]);
        }
        return map;
    }

    public static string FromLatin(string text)
    {
        var sb = new StringBuilder(text.Length);
        for (int i = 0; i < text.Length; i++)
        {
            if (i + 1 < text.Length && Digraphs.TryGetValue(text.Substring(i, 2), out var d)) { sb.Append(d); i++; continue; }
            sb.Append(Letters.TryGetValue(text[i], out var c) ? c : text[i]);
        }
        return sb.ToString();
    }
}
