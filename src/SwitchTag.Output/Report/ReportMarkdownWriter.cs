using SwitchTag.Core.Documents;
using SwitchTag.Output.Html;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.Report;

/// <summary><c>index.md</c>: the readable report of one interview. It opens with the caution that it
/// is a machine draft. All transcript-derived text passes through <see cref="MarkdownText.Escape"/>.</summary>
public sealed class ReportMarkdownWriter : IInterviewWriter
{
    public string FileName => "index.md";

    public void Write(InterviewIndex index, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Render(index, text);
    }

    public const string Caution =
        "**Machine draft — review before publication.** This index, its place links and the translators' worklist " +
        "were produced automatically by SwitchTag. Names may be missed, mislabelled or linked to the wrong place. " +
        "A person must review this report against the recording before any of it is published.";

    public static string Render(InterviewIndex index)
    {
        var text = new StringWriter();
        Render(index, text);
        return text.ToString();
    }

    /// <summary>The report, written to <paramref name="md"/> as it is made.</summary>
    public static void Render(InterviewIndex index, TextWriter md)
    {
        var name = MarkdownText.Escape(index.Transcript.Id);
        md.Append("# Interview index: ").Append(name).Append("\n\n");
        md.Append("> ").Append(Caution).Append("\n\n");
        md.Append("- Source: ").Append(MarkdownText.Escape(index.Transcript.Source.Path))
          .Append(" (").Append(index.Transcript.Source.Format.Name).Append(")\n");
        md.Append("- SHA-256: ").Append(index.Transcript.Source.Sha256).Append('\n');
        md.Append("- Main language: ").Append(MarkdownText.Escape(LanguageNames.WithCode(index.MainLanguage)));
        if (MainLanguageText.Basis(index) is { } basis) md.Append(", ").Append(MarkdownText.Escape(basis));
        md.Append('\n');
        md.Append("- Duration: ").Append(index.Duration).Append('\n');
        md.Append("- Turns: ").Append(index.Turns.Length).Append(", mentions indexed: ")
          .Append(index.Mentions.Count(m => m.HeadingId is not null)).Append(", held for review: ").Append(index.Review.Length).Append("\n\n");

        Languages(md, index);
        foreach (var (label, title) in new[] { (NameLabel.PER, "People"), (NameLabel.LOC, "Places"), (NameLabel.ORG, "Organisations") })
            Headings(md, index, label, title);
        Review(md, index);
        Worklist(md, index);
        Diagnostics(md, index);
    }

    private static void Languages(TextWriter md, InterviewIndex index)
    {
        md.Append("## Languages\n\n");
        var table = new MarkdownTable(md, "| Language | Time (s) | Words |", "| --- | ---: | ---: |");
        foreach (var s in index.Languages)
            table.Row().Append("| ").Append(MarkdownText.Escape(s.Language.Code)).Append(" | ")
              .Append(s.Seconds.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)).Append(" | ").Append(s.Words).Append(" |\n");
        md.Append('\n');
    }

    private static void Headings(TextWriter md, InterviewIndex index, NameLabel label, string title)
    {
        var headings = index.Headings.Where(h => h.Label == label).ToList();
        md.Append("## ").Append(title).Append("\n\n");
        if (headings.Count == 0) { md.Append("None found.\n\n"); return; }
        var table = new MarkdownTable(md, "| Heading | Variants | Mentions | First | Times | Speakers | Place | Confidence |",
            "| --- | --- | ---: | --- | --- | --- | --- | ---: |");
        foreach (var h in headings)
        {
            var times = h.Mentions.Select(m => index.MentionAt(m).Time.Start.ToString());
            table.Row().Append("| **").Append(MarkdownText.Escape(h.Name)).Append("**").Append(PossiblySame(index, h)).Append(" | ")
              .Append(string.Join(", ", h.Variants.Select(MarkdownText.Escape))).Append(" | ")
              .Append(h.Mentions.Length).Append(" | ")
              .Append(h.Mentions.IsEmpty ? "" : index.MentionAt(h.Mentions[0]).Time.Start.ToString()).Append(" | ")
              .Append(string.Join(", ", times)).Append(" | ")
              .Append(string.Join(", ", h.Speakers.Select(MarkdownText.Escape))).Append(" | ")
              .Append(Place(h)).Append(" | ")
              .Append(Numbers.Confidence(h.Confidence)).Append(" |\n");
        }
        md.Append('\n');
    }

    /// <summary>The headings the index says may be the same person (a probable merge it did not make).</summary>
    private static string PossiblySame(InterviewIndex index, Heading h)
    {
        var names = h.PossiblySame.Select(id => index.Headings.FirstOrDefault(o => o.Id == id)).OfType<Heading>().Select(o => MarkdownText.Escape(o.Name)).ToList();
        return names.Count == 0 ? "" : " (possibly the same person as " + string.Join(", ", names) + ")";
    }

    private static string Place(Heading h)
    {
        var others = "; or: " + string.Join(", ", h.Alternatives.Take(5).Select(a => $"{MarkdownText.Escape(a.Name)}, {MarkdownText.Escape(a.Country)}"));
        if (h.Place is null)
            return h.Label != NameLabel.LOC ? "" : h.Alternatives.IsEmpty ? "not in the gazetteer" : "not linked: may be a historical place" + others;
        var p = h.Place;
        var text = $"{PlaceSource.Relation(h)}{MarkdownText.Escape(p.Name)}, {MarkdownText.Escape(p.Country)} ({PlaceSource.Describe(h)})";
        if (!h.Alternatives.IsEmpty)
            text += others;
        return text;
    }

    private static void Review(TextWriter md, InterviewIndex index)
    {
        md.Append("## For review\n\nThese mentions are held back from the index until a person decides (see the decisions file in SCHEMA.md).\n\n");
        if (index.Review.IsEmpty) { md.Append("Nothing held back.\n\n"); return; }
        var table = new MarkdownTable(md, "| Time | Speaker | Text | Label | Turn | Char | Reason |", "| --- | --- | --- | --- | ---: | ---: | --- |");
        foreach (var r in index.Review)
        {
            var (m, time, _) = index.MentionAt(r.Mention);
            table.Row().Append("| ").Append(time.Start).Append(" | ").Append(MarkdownText.Escape(index.TurnAt(m.Turn).Speaker)).Append(" | ")
              .Append(MarkdownText.Escape(m.Text)).Append(" | ").Append(m.Label).Append(" | ").Append(m.Turn.Index).Append(" | ")
              .Append(m.CharStart).Append(" | ").Append(MarkdownText.Escape(r.Reason)).Append(" |\n");
        }
        md.Append('\n');
    }

    private static void Worklist(TextWriter md, InterviewIndex index)
    {
        md.Append("## Translators' worklist\n\n");
        WorklistTable(md, index.Worklist.Where(w => !w.Check).ToList(), "No stretch outside the main language was found.");
        md.Append("## Check the language\n\nStretches whose language is too uncertain to claim: check the language before translating.\n\n");
        WorklistTable(md, index.Worklist.Where(w => w.Check).ToList(), "None.");
    }

    private static void WorklistTable(TextWriter md, List<WorklistItem> items, string empty)
    {
        if (items.Count == 0) { md.Append(empty).Append("\n\n"); return; }
        var table = new MarkdownTable(md, "| Start | End | Speaker | Language | Confidence | Text |", "| --- | --- | --- | --- | ---: | --- |");
        foreach (var item in items)
            table.Row().Append("| ").Append(item.Time.Start).Append(" | ").Append(item.Time.End).Append(" | ")
              .Append(MarkdownText.Escape(item.Speaker)).Append(" | ").Append(MarkdownText.Escape(LanguageNames.WithCode(item.Language))).Append(" | ")
              .Append(Numbers.Confidence(item.Confidence)).Append(" | ").Append(MarkdownText.Escape(item.Text)).Append(" |\n");
        md.Append('\n');
    }

    private static void Diagnostics(TextWriter md, InterviewIndex index)
    {
        if (index.Diagnostics.IsEmpty) return;
        md.Append("## Reading notes\n\n");
        foreach (var d in index.Diagnostics)
            md.Append("- ").Append(MarkdownText.Escape(d.ToString())).Append('\n');
        md.Append('\n');
    }
}
