namespace SwitchTag.LanguageId.Text;

/// <summary>What a token contributes to language evidence.</summary>
public enum TokenKind
{
    /// <summary>A run of letters (with inner apostrophes or hyphens): carries language evidence.</summary>
    Word,
    /// <summary>Digits, possibly with inner separators ("1,944", "10:30").</summary>
    Number,
    /// <summary>A filler of every language (uh, um, mhm, hmm...; the mul language profile's hesitations.txt): neutral.</summary>
    Hesitation,
    /// <summary>A transcriber tag in square brackets ([laughs], [inaudible]): neutral.</summary>
    Tag,
    /// <summary>A cut-off word such as "w-" in "I w- I went": neutral.</summary>
    FalseStart,
}

/// <summary>A token of a text: [Start, End) char offsets into the original string.</summary>
public readonly record struct Token(int Start, int End, TokenKind Kind)
{
    public int Length => End - Start;

    public bool IsNeutral => Kind != TokenKind.Word;
}
