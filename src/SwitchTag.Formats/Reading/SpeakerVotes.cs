
namespace SwitchTag.Formats.Reading;

/// <summary>Decides, for one file, whether its <c>NAME:</c> prefixes name speakers. A prefix alone
/// cannot tell "ANNA: we left" from "Libellen: deren Flügelstruktur…" (a capitalised noun and a colon,
/// common in German), and taking the noun as a speaker would give it every later cue. A file uses
/// speaker labels when one of its labels heads at least two lines or cues, or is written in capitals
/// (ANNA, LMP (EAGLE), A): a speaker is named again, a content word rarely heads two cues. In a file
/// with no such label, prefixes stay text. Caption formats (SRT, WebVTT without voices) are voted on;
/// typed transcripts trust every prefix (<see cref="Trusting"/>), because there a name before a colon
/// at the start of an entry is the convention, and a two-person interview may name each speaker once.</summary>
internal sealed class SpeakerVotes
{
    private readonly bool labelled;

    /// <summary>Takes every prefix as a speaker label.</summary>
    public static SpeakerVotes Trusting { get; } = new(labelled: true);

    private SpeakerVotes(bool labelled) => this.labelled = labelled;

    /// <summary>Counts the prefix of each text that has one.</summary>
    public SpeakerVotes(IEnumerable<string> texts)
    {
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var text in texts)
        {
            if (!SpeakerPrefix.TryMatch(text, out int start, out int end, out _)) continue;
            var label = text.AsSpan(start, end - start);
            string key = Key(label);
            int count = counts[key] = counts.GetValueOrDefault(key) + 1;
            if (count >= 2 || IsCapitals(label)) { labelled = true; return; }
        }
    }

    /// <summary>Like <see cref="SpeakerPrefix.TryMatch"/>, in a file that uses speaker labels.</summary>
    public bool TryMatch(ReadOnlySpan<char> line, out int labelStart, out int labelEnd, out int textStart)
    {
        labelStart = labelEnd = textStart = 0;
        return labelled && SpeakerPrefix.TryMatch(line, out labelStart, out labelEnd, out textStart);
    }

    private static string Key(ReadOnlySpan<char> label) => SpeakerLabels.Normalise(label.ToString()) ?? "";

    private static bool IsCapitals(ReadOnlySpan<char> label)
    {
        int letters = 0;
        foreach (char c in label)
        {
            if (!char.IsLetter(c)) continue;
            if (!char.IsUpper(c)) return false;
            letters++;
        }
        return letters >= 1;
    }
}
