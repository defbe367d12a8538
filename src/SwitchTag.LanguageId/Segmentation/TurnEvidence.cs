using SwitchTag.LanguageId.Text;

namespace SwitchTag.LanguageId.Segmentation;

/// <summary>The words of one turn that carry language evidence, with per class: the raw
/// log-likelihood (<see cref="Scores"/>) and the decoder's emission (<see cref="Emissions"/>:
/// tempered, relative to the word's best class, floored, times the word's weight, and 0 for
/// languages in which the word is a filler).</summary>
internal sealed class TurnEvidence(List<Token> tokens)
{
    public List<Token> Tokens { get; } = tokens;

    /// <summary>Index into <see cref="Tokens"/> of each evidence word.</summary>
    public List<int> TokenIndex { get; } = [];

    public List<float[]> Scores { get; } = [];

    public List<float[]> Emissions { get; } = [];

    /// <summary>1 for an ordinary word, the name weight for a name-like one.</summary>
    public List<float> Weights { get; } = [];

    public int Count => TokenIndex.Count;

    public float TotalWeight
    {
        get { float s = 0; foreach (var w in Weights) s += w; return s; }
    }
}
