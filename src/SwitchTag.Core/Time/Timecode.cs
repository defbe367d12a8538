using System.Globalization;

namespace SwitchTag.Core.Time;

/// <summary>A point in a recording, held as whole milliseconds so arithmetic is exact (captions are
/// millisecond-precise; a double of seconds would drift when summed).</summary>
public readonly record struct Timecode(long Milliseconds) : IComparable<Timecode>
{
    public static readonly Timecode Zero = new(0);

    public static Timecode FromSeconds(double seconds) => new((long)Math.Round(seconds * 1000.0, MidpointRounding.AwayFromZero));

    public static Timecode FromParts(int hours, int minutes, int seconds, int milliseconds) =>
        new(((hours * 60L + minutes) * 60L + seconds) * 1000L + milliseconds);

    /// <summary>Seconds as a number, the unit of every time in the JSON outputs.</summary>
    public double TotalSeconds => Milliseconds / 1000.0;

    public int CompareTo(Timecode other) => Milliseconds.CompareTo(other.Milliseconds);

    public static bool operator <(Timecode a, Timecode b) => a.Milliseconds < b.Milliseconds;
    public static bool operator >(Timecode a, Timecode b) => a.Milliseconds > b.Milliseconds;
    public static bool operator <=(Timecode a, Timecode b) => a.Milliseconds <= b.Milliseconds;
    public static bool operator >=(Timecode a, Timecode b) => a.Milliseconds >= b.Milliseconds;
    public static Timecode operator +(Timecode a, Duration d) => new(a.Milliseconds + d.Milliseconds);
    public static Duration operator -(Timecode a, Timecode b) => new(a.Milliseconds - b.Milliseconds);

    public static Timecode Max(Timecode a, Timecode b) => a >= b ? a : b;
    public static Timecode Min(Timecode a, Timecode b) => a <= b ? a : b;

    /// <summary>Human-facing form <c>HH:MM:SS.mmm</c> (hours grow past 99 if they must).</summary>
    public override string ToString() => Clock.Format(Milliseconds);

    /// <summary>Seconds with millisecond precision in invariant culture, for JSON and CSV.</summary>
    public string ToSecondsString() => TotalSeconds.ToString("0.###", CultureInfo.InvariantCulture);
}
