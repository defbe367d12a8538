using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Store;

/// <summary>What the store knows about one indexed source file, enough to decide whether to redo it.</summary>
/// <param name="SourcePath">Full path of the transcript file: the interview's identity in the store.</param>
/// <param name="Folder">The interview's folder name under the output folder.</param>
/// <param name="ModelVersions">The caller's fingerprint of the models, options and code that made the index.</param>
public sealed record StoredInterview(string SourcePath, string Folder, string Name, string Sha256, string ModelVersions);

/// <summary>A reviewer decision as it was applied to one interview.</summary>
public sealed record StoredDecision(string Decision, int Applied);

/// <summary>One interview of the collection, as the collection pages show it: its headings, its
/// mentions (for the review page) and the text of the reviewer decisions applied to it.</summary>
public sealed record CollectionInterview(string Name, string Folder, LanguageCode MainLanguage, Timecode Duration, ImmutableArray<CollectionHeadingUse> Headings,
    ImmutableArray<StoredMention> Mentions, ImmutableArray<string> Decisions);

/// <summary>One heading of one interview with the start times of its mentions, in time order, and its variants.</summary>
public sealed record CollectionHeadingUse(HeadingId Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times, ImmutableArray<string> Variants);

/// <summary>One mention in index order, with its turn's whole text (one string per turn, shared by its
/// mentions) so a caller can cut the sentence around it.</summary>
public sealed record StoredMention(Timecode Time, Mention Mention, string? Speaker, HeadingId? HeadingId, string? ReviewReason, string TurnText);
