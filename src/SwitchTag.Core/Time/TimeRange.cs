namespace SwitchTag.Core.Time;

/// <summary>A half-open stretch of a recording, <c>[Start, End)</c>.</summary>
public readonly record struct TimeRange(Timecode Start, Timecode End)
{
    public long DurationMilliseconds => End - Start;

    public bool Contains(Timecode t) => t >= Start && t <= End;

    /// <summary>The time at a fraction (0..1) of the way through, rounded to the millisecond.</summary>
    public Timecode At(double fraction) =>
        new(Start.Milliseconds + (long)Math.Round(DurationMilliseconds * Math.Clamp(fraction, 0.0, 1.0), MidpointRounding.AwayFromZero));

    public override string ToString() => $"{Start} --> {End}";
}
