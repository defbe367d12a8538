using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Formats;

/// <summary>What reading one file gave: the transcript, or null when the file was rejected (then an
/// Error diagnostic says where and why), and every diagnostic found on the way.</summary>
public sealed record ReadResult(Transcript? Transcript, ImmutableArray<Diagnostic> Diagnostics)
{
    public bool Accepted => Transcript is not null;
}
