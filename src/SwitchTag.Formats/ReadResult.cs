using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Formats;

/// <summary>What reading one file gave: the transcript, or null when the file was rejected (then an
/// Error diagnostic says where and why), and every diagnostic found on the way. <see cref="Text"/> is
/// the decoded file (BOM removed, line endings unchanged), which every cue's <see cref="Cue.Raw"/>
/// points into; null when the file was not decoded.</summary>
public sealed record ReadResult(Transcript? Transcript, ImmutableArray<Diagnostic> Diagnostics, string? Text = null)
{
    public bool Accepted => Transcript is not null;
}
