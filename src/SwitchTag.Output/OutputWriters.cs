using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Output.AnnotatedVtt;
using SwitchTag.Output.Collection;
using SwitchTag.Output.IndexJson;
using SwitchTag.Output.MentionsCsv;
using SwitchTag.Output.PlacesGeoJson;
using SwitchTag.Output.Report;
using SwitchTag.Output.Review;
using SwitchTag.Output.TeiXml;
using SwitchTag.Output.WorklistCsv;

namespace SwitchTag.Output;

/// <summary>The registry of writers: per-interview files and collection files, each written
/// atomically (<see cref="AtomicFile"/>). File names must be unique within each kind.</summary>
public sealed class OutputWriters
{
    private readonly List<IInterviewWriter> _interview = [];
    private readonly List<ICollectionWriter> _collection = [];

    /// <summary>Every shipped output, in the order SCHEMA.md lists them.</summary>
    public static OutputWriters Default => new OutputWriters()
        .Add(new IndexJsonWriter())
        .Add(new ReportMarkdownWriter())
        .Add(new ReportHtmlWriter())
        .Add(new MentionsCsvWriter())
        .Add(new WorklistCsvWriter())
        .Add(new PlacesGeoJsonWriter())
        .Add(new AnnotatedVttWriter())
        .Add(new TeiXmlWriter())
        .Add(new CollectionJsonWriter())
        .Add(new CollectionHtmlWriter())
        .Add(new ReviewHtmlWriter());

    public IReadOnlyList<IInterviewWriter> Interview => _interview;
    public IReadOnlyList<ICollectionWriter> Collection => _collection;

    public IEnumerable<string> InterviewFileNames => _interview.Select(w => w.FileName);
    public IEnumerable<string> CollectionFileNames => _collection.Select(w => w.FileName);

    public OutputWriters Add(IInterviewWriter writer)
    {
        if (_interview.Any(w => w.FileName == writer.FileName)) throw new ArgumentException($"two writers of {writer.FileName}");
        _interview.Add(writer);
        return this;
    }

    public OutputWriters Add(ICollectionWriter writer)
    {
        if (_collection.Any(w => w.FileName == writer.FileName)) throw new ArgumentException($"two writers of {writer.FileName}");
        _collection.Add(writer);
        return this;
    }

    /// <summary>Every per-interview file into <paramref name="folder"/>. After each file of a long
    /// interview its scratch is given back, so the files' peaks do not add up (<see cref="LongTalk"/>).</summary>
    public void WriteInterview(InterviewIndex index, string folder)
    {
        bool isLong = LongTalk.IsLong(index.Turns);
        foreach (var w in _interview)
        {
            AtomicFile.Write(Path.Combine(folder, w.FileName), s => w.Write(index, s));
            if (isLong) LongTalk.Compact();
        }
    }

    /// <summary>Every collection file into <paramref name="outDir"/>.</summary>
    public void WriteCollection(IReadOnlyList<CollectionEntry> entries, string outDir)
    {
        foreach (var w in _collection) AtomicFile.Write(Path.Combine(outDir, w.FileName), s => w.Write(entries, s));
    }
}
