using SwitchTag.Core.Time;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Points and lengths kept apart as NodaTime keeps Instant and Duration (Instant - Instant is a
/// Duration, Instant + Duration an Instant; from memory); times shown in WebVTT's timestamp form.</summary>
public class DurationTests
{
    [Fact]
    public void A_point_minus_a_point_is_a_duration_and_back()
    {
        var start = Timecode.FromParts(1, 2, 3, 4);
        var end = Timecode.FromParts(1, 3, 3, 4);
        Duration length = end - start;
        // One minute is 60 000 ms (SI second, ISO 80000-3 minute).
        Assert.Equal(60_000, length.Milliseconds);
        Assert.Equal(end, start + length);
        Assert.Equal(60.0, length.TotalSeconds);
    }

    [Fact]
    public void A_duration_shows_in_the_webvtt_timestamp_form()
    {
        // W3C WebVTT timestamp: hours, then "mm:ss.ttt" with two-digit minutes and seconds and three-digit milliseconds.
        Assert.Equal("01:02:03.004", new Duration(3_723_004).ToString());
        Assert.Equal("00:00:00.000", Duration.Zero.ToString());
        // WebVTT allows more than two hour digits ("hh" is "two or more digits").
        Assert.Equal("100:00:00.000", new Duration(360_000_000).ToString());
    }

    [Fact]
    public void Durations_order_and_add_by_length()
    {
        Assert.True(new Duration(1) < new Duration(2));
        Assert.Equal(new Duration(3), new Duration(1) + new Duration(2));
        Assert.Equal(-1, new Duration(5).CompareTo(new Duration(6)));
    }
}
