namespace SwitchTag.Tagging;

/// <summary>Scores of one <c>eval ner</c> run: pooled over every sentence (keys micro, PER, LOC,
/// ORG), and the same per source and per language of the gold files (<see cref="GoldFileLabel"/>),
/// keys in ordinal order.</summary>
public sealed record NerReport(
    IReadOnlyDictionary<string, PrfScore> Overall,
    IReadOnlyDictionary<string, IReadOnlyDictionary<string, PrfScore>> BySource,
    IReadOnlyDictionary<string, IReadOnlyDictionary<string, PrfScore>> ByLanguage);
