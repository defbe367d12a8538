using System.Globalization;

namespace SwitchTag.Core.Time;

/// <summary>A length of recording in whole milliseconds: what <c>Timecode - Timecode</c> gives and
/// <c>Timecode + Duration</c> takes, kept apart from points in time as NodaTime keeps Duration apart
/// from Instant.</summary>
public readonly record struct Duration(long Milliseconds) : IComparable<Duration>
{
    public static readonly Duration Zero = new(0);

    /// <summary>Seconds as a number, the unit of every time in the JSON outputs.</summary>
    public double TotalSeconds => Milliseconds / 1000.0;

    public int CompareTo(Duration other) => Milliseconds.CompareTo(other.Milliseconds);

    public static bool operator <(Duration a, Duration b) => a.Milliseconds < b.Milliseconds;
    public static bool operator >(Duration a, Duration b) => a.Milliseconds > b.Milliseconds;
    public static bool operator <=(Duration a, Duration b) => a.Milliseconds <= b.Milliseconds;
    public static bool operator >=(Duration a, Duration b) => a.Milliseconds >= b.Milliseconds;
    public static Duration operator +(Duration a, Duration b) => new(a.Milliseconds + b.Milliseconds);

    /// <summary>Human-facing form <c>HH:MM:SS.mmm</c>, as a <see cref="Timecode"/> shows.</summary>
    public override string ToString() => Clock.Format(Milliseconds);
}

/// <summary>The <c>HH:MM:SS.mmm</c> form shared by points and lengths (hours grow past 99 if they must).</summary>
internal static class Clock
{
    public static string Format(long ms)
    {
        string sign = ms < 0 ? "-" : "";
        ms = Math.Abs(ms);
        return string.Create(CultureInfo.InvariantCulture,
            $"{sign}{ms / 3_600_000:00}:{ms / 60_000 % 60:00}:{ms / 1000 % 60:00}.{ms % 1000:000}");
    }
}
