using SwitchTag.Core.Documents;

namespace SwitchTag.Tagging;

/// <summary>A tagged name over words <c>[Start, End)</c> of a sentence; confidence is the mean
/// softmax probability of its words' decoded tags.</summary>
public readonly record struct WordSpan(int Start, int End, NameLabel Label, double Confidence);
