using SwitchTag.Core.Time;

namespace SwitchTag.Formats.Timestamped;

/// <summary>How long an entry with no stated end lasts: 15 characters a second (a calm speaking pace of
/// about 150 words a minute at roughly 6 characters a word, spaces included), at least one second.</summary>
internal static class SpeakingRate
{
    public const int CharactersPerSecond = 15;
    public const long MinimumMilliseconds = 1000;

    public static long EstimateMilliseconds(int characters) =>
        Math.Max(MinimumMilliseconds, characters * 1000L / CharactersPerSecond);

    public static Timecode EstimateEnd(Timecode start, int characters) => start + new Duration(EstimateMilliseconds(characters));
}
