namespace SwitchTag.LanguageId.Segmentation;

/// <summary>Per-class terms of the word-level Viterbi: <see cref="Start"/> for the first word,
/// <see cref="Enter"/> the cost of switching into a class, <see cref="Bonus"/> added to every word
/// of a class. Log-space, nats.</summary>
internal sealed record DecoderPriors(float[] Start, float[] Enter, float[] Bonus);
