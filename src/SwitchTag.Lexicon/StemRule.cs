using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>Case endings of one language, written folded (no diacritics), and the sound changes
/// a stem undergoes before them. <see cref="Endings"/> are every ending a name may carry in running
/// text; <see cref="NominativeEndings"/> the ones a dictionary form (gazetteer, authority list) carries.</summary>
public sealed class StemRule
{
    /// <summary>Shortest stem left after stripping: shorter names stay whole, so "Ryga" → "ryg" but
    /// "Ufa" stays "ufa".</summary>
    public const int MinStem = 3;

    /// <summary>Shortest stem when a rule is tried only as a fallback for a text of another or unknown
    /// language: "Texas" must not become Lithuanian "tex-as".</summary>
    public const int FallbackMinStem = 4;

    private readonly string[] _endings;
    private readonly string[] _nominative;
    private readonly Func<string, IEnumerable<string>> _alternations;
    private readonly Func<string, string> _normalise;
    private readonly Func<string, string, bool> _allows;

    public StemRule(
        LanguageCode language,
        IEnumerable<string> endings,
        IEnumerable<string> nominativeEndings,
        Func<string, IEnumerable<string>>? alternations = null,
        Func<string, string>? normaliseStem = null,
        Func<string, string, bool>? allows = null)
    {
        Language = language;
        _endings = endings.OrderByDescending(e => e.Length).ThenBy(e => e, StringComparer.Ordinal).ToArray();
        _nominative = nominativeEndings.OrderByDescending(e => e.Length).ThenBy(e => e, StringComparer.Ordinal).ToArray();
        _alternations = alternations ?? (_ => []);
        _normalise = normaliseStem ?? (s => s);
        _allows = allows ?? ((_, _) => true);
    }

    public LanguageCode Language { get; }

    public IReadOnlyList<string> Endings => _endings;

    public IReadOnlyList<string> NominativeEndings => _nominative;

    /// <summary>The word with its longest ending stripped (one ending, stem kept ≥ <see cref="MinStem"/>).</summary>
    public string Stem(string word) => StripLongest(word, _endings);

    /// <summary>The stem of a dictionary form: only nominative endings are stripped, so "Bytom"
    /// keeps its "-om" while "Warszawa" loses its "-a".</summary>
    public string NominativeStem(string word) => StripLongest(word, _nominative);

    /// <summary>Every stem the word may have: the word itself, the word minus each ending that fits,
    /// and those stems with the language's sound changes undone ("pradz" → "prag"). As a fallback
    /// (<paramref name="fallback"/>) stems keep <see cref="FallbackMinStem"/> letters and sound
    /// changes are not undone: weaker evidence needs a closer match.</summary>
    public IEnumerable<string> Stems(string word, bool fallback = false)
    {
        int minStem = fallback ? FallbackMinStem : MinStem;
        yield return word;
        foreach (var ending in _endings)
        {
            if (!Fits(word, ending)) continue;
            var stem = _normalise(word[..^ending.Length]);
            if (stem.Length < minStem) continue;
            yield return stem;
            if (fallback) continue;
            foreach (var alt in _alternations(stem))
                if (alt.Length >= MinStem) yield return alt;
        }
    }

    private string StripLongest(string word, string[] endings)
    {
        foreach (var ending in endings)
        {
            if (!Fits(word, ending)) continue;
            var stem = _normalise(word[..^ending.Length]);
            if (stem.Length >= MinStem) return stem;
        }
        return word;
    }

    private bool Fits(string word, string ending) =>
        word.Length - ending.Length >= MinStem && word.EndsWith(ending, StringComparison.Ordinal)
        && _allows(word[..^ending.Length], ending);
}
