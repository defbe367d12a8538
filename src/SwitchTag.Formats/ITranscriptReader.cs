using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;

namespace SwitchTag.Formats;

/// <summary>One transcript format: its names, the file extensions it is looked for under, how its
/// content is recognised, and how it is read into cues. Reading never throws on bad input: problems go
/// to <see cref="Diagnostics"/> with their line (FORMATS.md).</summary>
public interface ITranscriptReader
{
    TranscriptFormat Format { get; }

    /// <summary>Other names <c>--format</c> accepts (vtt, txt, md).</summary>
    IReadOnlyList<string> Aliases { get; }

    /// <summary>Extensions a folder walk picks up, lower case with the dot.</summary>
    IReadOnlyList<string> Extensions { get; }

    /// <summary>Whether a file named with one of <see cref="Extensions"/> is expected to hold this
    /// format, so content reading otherwise earns a warning (a .txt file may hold any format).</summary>
    bool ClaimsExtensions { get; }

    /// <summary>What that warning adds when this format's signature is absent, or null.</summary>
    string? MissingSignature { get; }

    /// <summary>Whether <paramref name="text"/> reads as this format; <paramref name="extension"/> may
    /// only break a tie between formats whose content looks alike.</summary>
    bool Detects(string text, string extension);

    /// <summary>The cues, or null when the file is not of this format (an Error says why).</summary>
    ImmutableArray<Cue>? Read(SourceText source, Diagnostics diagnostics);
}
