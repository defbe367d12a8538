using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Store;

/// <summary>What the store knows about one indexed source file, enough to decide whether to redo it.</summary>
/// <param name="SourcePath">Full path of the transcript file: the interview's identity in the store.</param>
/// <param name="Folder">The interview's folder name under the output folder.</param>
/// <param name="ModelVersions">The caller's fingerprint of the models, options and code that made the index.</param>
public sealed record StoredInterview(string SourcePath, string Folder, string Name, string Sha256, string ModelVersions);

/// <summary>A reviewer decision as it was applied to one interview.</summary>
public sealed record StoredDecision(string Decision, int Applied);

/// <summary>One interview of the collection, as <c>collection.json</c> lists it.</summary>
public sealed record CollectionInterview(string Name, string Folder, string MainLanguage, Timecode Duration, ImmutableArray<CollectionHeadingUse> Headings);

/// <summary>One heading of one interview with the start times of its mentions, in time order.</summary>
public sealed record CollectionHeadingUse(string Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times);
