namespace SwitchTag.Tagging;

/// <summary>One word of a text: <c>[Start, End)</c> char offsets into the original and its text.</summary>
public readonly record struct WordToken(int Start, int End, string Text);
