using SwitchTag.Core.Documents;
using SwitchTag.Output.Tei;

namespace SwitchTag.Output;

/// <summary>Writes every per-interview output into one folder, each file atomically.</summary>
public static class InterviewOutputs
{
    public static readonly IReadOnlyList<string> FileNames =
        ["index.json", "index.md", "index.html", "mentions.csv", "worklist.csv", "places.geojson", "annotated.vtt", "index.tei.xml"];

    public static void Write(InterviewIndex index, string folder)
    {
        AtomicFile.Write(Path.Combine(folder, "index.json"), s => IndexJsonWriter.Write(index, s));
        string markdown = ReportMarkdownWriter.Render(index);
        AtomicFile.WriteText(Path.Combine(folder, "index.md"), markdown);
        AtomicFile.WriteText(Path.Combine(folder, "index.html"), HtmlReport.Render($"Interview index: {index.Transcript.Name}", markdown));
        AtomicFile.WriteText(Path.Combine(folder, "mentions.csv"), MentionsCsvWriter.Render(index));
        AtomicFile.WriteText(Path.Combine(folder, "worklist.csv"), WorklistCsvWriter.Render(index));
        AtomicFile.Write(Path.Combine(folder, "places.geojson"), s => PlacesGeoJsonWriter.Write(index, s));
        AtomicFile.WriteText(Path.Combine(folder, "annotated.vtt"), AnnotatedVttWriter.Render(index));
        AtomicFile.Write(Path.Combine(folder, "index.tei.xml"), s => TeiWriter.Write(index, s));
    }

    public static void WriteCollection(IReadOnlyList<CollectionEntry> entries, string outDir)
    {
        AtomicFile.Write(Path.Combine(outDir, "collection.json"), s => CollectionWriter.WriteJson(entries, s));
        AtomicFile.WriteText(Path.Combine(outDir, "collection.html"), HtmlReport.Render("Collection index", CollectionWriter.RenderMarkdown(entries)));
    }
}
