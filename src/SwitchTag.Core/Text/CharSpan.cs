namespace SwitchTag.Core.Text;

/// <summary>Char offsets <c>[Start, End)</c> into the text they were computed on: the start char is
/// inside, the end char is not, so spans that meet do not overlap and <c>End - Start</c> is the
/// length (the convention of .NET's <see cref="Range"/> and of string slicing). A negative start or
/// an end before the start is refused.</summary>
public readonly record struct CharSpan
{
    public CharSpan(int start, int end)
    {
        if (start < 0) throw new ArgumentOutOfRangeException(nameof(start), $"a char span cannot start before the text ({start})");
        if (end < start) throw new ArgumentOutOfRangeException(nameof(end), $"a char span cannot end ({end}) before it starts ({start})");
        Start = start;
        End = end;
    }

    public int Start { get; }
    public int End { get; }

    public int Length => End - Start;

    public bool IsEmpty => End == Start;

    public bool Contains(int offset) => offset >= Start && offset < End;

    public void Deconstruct(out int start, out int end) => (start, end) = (Start, End);

    public override string ToString() => $"[{Start}, {End})";
}
