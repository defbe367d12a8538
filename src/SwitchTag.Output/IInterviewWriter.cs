using SwitchTag.Core.Documents;

namespace SwitchTag.Output;

/// <summary>Writes one file of one interview from its finished index. A writer only writes: every
/// number it shows (language shares, word counts, foreign spans, decision outcomes) is on the index.</summary>
public interface IInterviewWriter
{
    /// <summary>The file's name inside the interview's folder.</summary>
    string FileName { get; }

    void Write(InterviewIndex index, Stream stream);
}

/// <summary>Writes one file about the whole run from what each interview left for it.</summary>
public interface ICollectionWriter
{
    /// <summary>The file's name inside the output folder.</summary>
    string FileName { get; }

    void Write(IReadOnlyList<CollectionEntry> entries, Stream stream);
}
