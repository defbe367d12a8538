using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>The half-open interval contract NodaTime documents for its Interval (start inclusive,
/// end exclusive; from memory), and WebVTT cue timings (W3C WebVTT, "end time" after "start time").</summary>
public class TimeRangeTests
{
    private static TimeRange Range(long start, long end) => new(new Timecode(start), new Timecode(end));

    [Fact]
    public void Contains_its_start_but_not_its_end()
    {
        var range = Range(1_000, 2_000);
        // NodaTime Interval.Contains: Start <= instant < End (from memory).
        Assert.True(range.Contains(new Timecode(1_000)));
        Assert.True(range.Contains(new Timecode(1_999)));
        Assert.False(range.Contains(new Timecode(2_000)));
        Assert.False(range.Contains(new Timecode(999)));
    }

    [Fact]
    public void Ranges_that_meet_share_no_instant()
    {
        // Half-open intervals [a, b) and [b, c) are disjoint: b belongs to the second only (from memory, NodaTime).
        var first = Range(0, 5_000);
        var second = Range(5_000, 9_000);
        Assert.False(first.Contains(second.Start));
        Assert.True(second.Contains(second.Start));
    }

    [Fact]
    public void An_empty_range_contains_nothing()
    {
        // NodaTime: an interval whose start equals its end is empty (from memory).
        var empty = Range(3_000, 3_000);
        Assert.False(empty.Contains(new Timecode(3_000)));
        Assert.Equal(Duration.Zero, empty.Duration);
    }

    [Fact]
    public void An_end_before_the_start_is_refused()
    {
        // NodaTime's Interval constructor throws ArgumentOutOfRangeException when end < start (from memory).
        Assert.Throws<ArgumentOutOfRangeException>(() => Range(2_000, 1_999));
    }

    [Fact]
    public void Its_duration_is_end_minus_start()
    {
        // WebVTT example cue "00:00:11.000 --> 00:00:13.000" lasts two seconds (W3C WebVTT, section 1).
        var range = new TimeRange(Timecode.FromParts(0, 0, 11, 0), Timecode.FromParts(0, 0, 13, 0));
        Assert.Equal(new Duration(2_000), range.Duration);
        Assert.Equal("00:00:11.000 --> 00:00:13.000", range.ToString());
    }
}
