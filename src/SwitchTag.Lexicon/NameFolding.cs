using System.Globalization;
using System.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>Spelling-insensitive forms of names: folding (case and diacritics), per-language
/// stripping of case endings, and the grouping key built from both.</summary>
public static class NameFolding
{
    /// <summary>NFKD, combining marks removed, invariant lower case, and the letters that carry their
    /// "diacritic" inside the code point (ß, ł, ø, đ, æ...) spelled out. Cyrillic й is kept: it is a
    /// letter of its own, not и with a mark; ё folds to е as Russian writing itself does.</summary>
    public static string Fold(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (IsFoldedAscii(text)) return text;
        var decomposed = WithoutLoneSurrogates(text).Normalize(NormalizationForm.FormKD);
        var sb = new StringBuilder(decomposed.Length);
        for (int i = 0; i < decomposed.Length; i++)
        {
            char c = decomposed[i];
            if (CharUnicodeInfo.GetUnicodeCategory(c) is UnicodeCategory.NonSpacingMark or UnicodeCategory.EnclosingMark)
            {
                // и + combining breve is й: keep it whole.
                if (c == '\u0306' && sb.Length > 0 && sb[^1] == 'и') sb[^1] = 'й';
                continue;
            }
            AppendFolded(sb, char.ToLowerInvariant(c));
        }
        return sb.ToString();
    }

    /// <summary>Strips one case ending of <paramref name="language"/> (ISO 639-1 or 639-3) from the folded word,
    /// keeping a stem of at least <see cref="StemRules.MinStem"/> letters. Languages without a rule
    /// return the word unchanged.</summary>
    public static string Stem(string word, LanguageCode language)
    {
        ArgumentNullException.ThrowIfNull(word);
        var folded = Fold(word);
        return StemRules.For(language) is { } rule ? rule.Stem(folded) : folded;
    }

    /// <summary>Grouping key for a whole name: folded, split into words, every word stemmed,
    /// joined by one space. "Krakowie" and "Kraków" share the key "krakow" in Polish.</summary>
    public static string Key(string name, LanguageCode language)
    {
        ArgumentNullException.ThrowIfNull(name);
        var words = NameWords.Split(Fold(name));
        return string.Join(' ', words.Select(w => Stem(w.Folded, language)));
    }

    /// <summary>Whether <paramref name="form"/>, written in <paramref name="language"/>, can be a case
    /// form of <paramref name="name"/> (a dictionary form): word by word, one of the form's stems is
    /// the name word or its nominative stem. A language without rules of its own (en, fr, und...)
    /// tries folded equality, then each rule in turn as a fallback (longer stems, no sound changes).</summary>
    public static bool IsInflectionOf(string form, string name, LanguageCode language)
    {
        ArgumentNullException.ThrowIfNull(form);
        ArgumentNullException.ThrowIfNull(name);
        var formWords = NameWords.Split(form);
        var nameWords = NameWords.Split(name);
        if (formWords.Count == 0 || formWords.Count != nameWords.Count) return false;
        var rule = StemRules.For(language);
        bool fallback = rule is null;
        IEnumerable<StemRule?> rules = fallback ? StemRules.All.Prepend(null) : [rule];
        return rules.Any(r => formWords.Zip(nameWords).All(p => InflectedMatcher.WordMeets(p.First.Folded, p.Second.Folded, r, fallback)));
    }

    /// <summary>Whether two mentions, each in its own language, can be the same name: equal keys, or
    /// either an inflected form of the other ("Anny" in Polish and "Anna" in English).</summary>
    public static bool SameName(string a, LanguageCode languageA, string b, LanguageCode languageB) =>
        Key(a, languageA) == Key(b, languageB)
        || IsInflectionOf(a, b, languageA)
        || IsInflectionOf(b, a, languageB);

    /// <summary>Folded words of a name joined by one space: the form the gazetteer and authority
    /// lists are indexed by ("Saint-Étienne" → "saint etienne").</summary>
    public static string FoldedWords(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        return string.Join(' ', NameWords.Split(Fold(name)).Select(w => w.Folded));
    }

    /// <summary>Normalisation rejects broken UTF-16; a lone surrogate becomes U+FFFD (same length,
    /// so word offsets stay valid).</summary>
    private static string WithoutLoneSurrogates(string text)
    {
        char[]? fixedText = null;
        for (int i = 0; i < text.Length; i++)
        {
            if (char.IsSurrogatePair(text, i)) { i++; continue; }
            if (!char.IsSurrogate(text[i])) continue;
            fixedText ??= text.ToCharArray();
            fixedText[i] = '\uFFFD';
        }
        return fixedText is null ? text : new string(fixedText);
    }

    private static bool IsFoldedAscii(string text)
    {
        foreach (char c in text)
            if (c > 0x7F || char.IsAsciiLetterUpper(c)) return false;
        return true;
    }

    private static void AppendFolded(StringBuilder sb, char c)
    {
        switch (c)
        {
            case 'ß': sb.Append("ss"); break;
            case 'ł': sb.Append('l'); break;
            case 'ø': sb.Append('o'); break;
            case 'đ' or 'ð': sb.Append('d'); break;
            case 'æ': sb.Append("ae"); break;
            case 'œ': sb.Append("oe"); break;
            case 'þ': sb.Append("th"); break;
            case 'ı': sb.Append('i'); break;
            case 'ħ': sb.Append('h'); break;
            case 'ŧ': sb.Append('t'); break;
            case 'ŀ': sb.Append('l'); break;
            case 'ƒ': sb.Append('f'); break;
            case 'ё': sb.Append('е'); break;
            case 'ς': sb.Append('σ'); break;
            case '\u2019' or '\u02BC' or '\u2018' or '`' or '\u00B4': sb.Append('\''); break;
            default: sb.Append(c); break;
        }
    }
}
