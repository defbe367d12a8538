namespace SwitchTag.Tagging;

/// <summary>A pre-tokenised gold sentence: its words and their IOB2 tags (PER/LOC/ORG or O), and
/// the 1-based line of its first word in the file.</summary>
public sealed record GoldSentence(IReadOnlyList<string> Words, IReadOnlyList<string> Tags, int Line);
