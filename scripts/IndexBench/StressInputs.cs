using System.Globalization;
using System.Text;
using SwitchTag.Core.Time;

/// <summary>Generated inputs for the cases where cost once grew faster than input: one speaker turn of
/// many cues, one line of 10 MB, and a decisions file of 100k rows. Deterministic, so two runs (or a
/// run of the benchmark and one of <c>switchtag index</c> on the written files) index the same text.</summary>
internal static class StressInputs
{
    // One cue in seven is Polish, so the giant turn holds many language spans and many mentions.
    private static string CueText(int i) => i % 7 == 3
        ? $"Potem pojechaliśmy z Krakowa do Lublina, to było w roku {1900 + i % 100}."
        : $"Then we went from Warsaw to Paris with Anna, number {i}.";

    /// <summary>WebVTT, one speaker, <paramref name="cues"/> cues of two seconds each.</summary>
    public static string OneTurn(int cues)
    {
        var sb = new StringBuilder("WEBVTT\n\n");
        for (int i = 0; i < cues; i++)
            sb.Append(new Timecode(i * 2000L)).Append(" --> ").Append(new Timecode(i * 2000L + 2000)).Append("\n<v Anna>").Append(CueText(i)).Append("\n\n");
        return sb.ToString();
    }

    /// <summary>Timestamped text: one entry whose text is one line of about <paramref name="chars"/> chars.</summary>
    public static string OneLine(int chars)
    {
        var sb = new StringBuilder("[00:00:01] ANNA: ");
        for (int i = 0; sb.Length < chars; i++) sb.Append(CueText(i)).Append(' ');
        sb.Append('\n');
        return sb.ToString();
    }

    /// <summary>A decisions file of <paramref name="rows"/> rows for the interviews named
    /// <paramref name="interviews"/>: mention decisions (reject, accept, relabel) at times within the
    /// first hour and heading decisions (reject, relabel, rename, merge), most naming nothing that is
    /// there, as a file grown over many reviews would.</summary>
    public static string Decisions(int rows, IReadOnlyList<string> interviews)
    {
        var sb = new StringBuilder("action,interview,label,name,time,value\n");
        string[] names = ["Warsaw", "Paris", "Anna", "Kraków", "Lublin", "Chicago", "Irena"];
        for (int i = 0; i < rows; i++)
        {
            string interview = interviews[i % interviews.Count];
            string name = i % 10 == 0 ? names[i / 10 % names.Length] : $"Name{i}";
            string time = (i * 7919 % 3_600_000 / 1000.0).ToString("0.000", CultureInfo.InvariantCulture);
            sb.Append((i % 7) switch
            {
                0 => $"reject-mention,{interview},,{name},{time},",
                1 => $"accept-mention,{interview},,{name},{time},",
                2 => $"relabel-mention,{interview},,{name},{time},LOC",
                3 => $"reject-heading,,PER,{name},,",
                4 => $"relabel-heading,{interview},PER,{name},,ORG",
                5 => $"rename-heading,,LOC,{name},,{name}-renamed",
                _ => $"merge-headings,,PER,{name},,per-anna",
            }).Append('\n');
        }
        return sb.ToString();
    }
}
