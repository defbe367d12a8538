namespace SwitchTag.Core.Time;

/// <summary>A half-open stretch of a recording, <c>[Start, End)</c>: it contains its start but not
/// its end, so ranges that meet do not overlap. An empty range (End = Start) contains nothing.
/// End before Start is refused: readers turn such input into a diagnostic before building one.</summary>
public readonly record struct TimeRange
{
    public TimeRange(Timecode start, Timecode end)
    {
        if (end < start) throw new ArgumentOutOfRangeException(nameof(end), $"a time range cannot end ({end}) before it starts ({start})");
        Start = start;
        End = end;
    }

    public Timecode Start { get; }
    public Timecode End { get; }

    public Duration Duration => End - Start;

    public bool Contains(Timecode t) => t >= Start && t < End;

    /// <summary>The time at a fraction (0..1) of the way through, rounded to the millisecond.</summary>
    public Timecode At(double fraction) =>
        new(Start.Milliseconds + (long)Math.Round(Duration.Milliseconds * Math.Clamp(fraction, 0.0, 1.0), MidpointRounding.AwayFromZero));

    public void Deconstruct(out Timecode start, out Timecode end) => (start, end) = (Start, End);

    public override string ToString() => $"{Start} --> {End}";
}
