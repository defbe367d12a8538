using SwitchTag.LanguageId.Text;

namespace SwitchTag.LanguageId.Segmentation;

/// <summary>The words of one turn that carry language evidence, with per class: the raw
/// log-likelihood (<see cref="Scores"/>) and the decoder's emission (<see cref="Emissions"/>:
/// tempered, relative to the word's best class, floored, times the word's weight, and 0 for
/// languages in which the word is a filler).</summary>
internal sealed class TurnEvidence(List<Token> tokens)
{
    public List<Token> Tokens { get; } = tokens;

    // Sized for every token at once: lists that double as they fill leave each of their earlier
    // arrays behind, and for one speaker turn of two million words those are large objects (some
    // 50 MB of them) that only a full collection takes back.

    /// <summary>Index into <see cref="Tokens"/> of each evidence word.</summary>
    public List<int> TokenIndex { get; } = new(tokens.Count);

    public List<float[]> Scores { get; } = new(tokens.Count);

    public List<float[]> Emissions { get; } = new(tokens.Count);

    /// <summary>1 for an ordinary word, the name weight for a name-like one.</summary>
    public List<float> Weights { get; } = new(tokens.Count);

    public int Count => TokenIndex.Count;

    public float TotalWeight
    {
        get { float s = 0; foreach (var w in Weights) s += w; return s; }
    }
}
