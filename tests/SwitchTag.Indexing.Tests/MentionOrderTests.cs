using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;

namespace SwitchTag.Indexing.Tests;

/// <summary>The index stage takes mentions in text order as they come (the tag stage gives them so)
/// and sorts any other order: both give the same index.</summary>
public class MentionOrderTests
{
    [Fact]
    public void Mentions_in_text_order_and_in_any_other_order_give_the_same_index()
    {
        var transcript = Fixture.Transcript();
        var turns = TurnBuilder.Build(transcript);
        var english = new LanguageCode("en");
        ILanguageSegmenter segmenter = Fixture.Segmenter();
        var spans = segmenter.SegmentInterview(turns, english).Spans;
        var tagger = Fixture.Tagger();
        var found = turns.SelectMany(t => tagger.Tag(t.Id, t.Text, spans[t.Id.Index])).ToImmutableArray();
        var inTextOrder = found.OrderBy(m => m.Turn).ThenBy(m => m.CharStart).ToImmutableArray();
        Assert.False(found.SequenceEqual(inTextOrder)); // the fake tagger finds longer names first
        var builder = new IndexBuilder(Fixture.Lexicon());

        var fromOrdered = builder.Build(transcript, turns, english, spans, inTextOrder);
        var fromReversed = builder.Build(transcript, turns, english, spans, [.. inTextOrder.Reverse()]);
        var fromFound = builder.Build(transcript, turns, english, spans, found);

        Assert.Equal(inTextOrder, fromOrdered.Mentions.Select(m => m.Mention));
        foreach (var other in new[] { fromReversed, fromFound })
        {
            Assert.Equal(fromOrdered.Mentions.AsEnumerable(), other.Mentions.AsEnumerable());
            Assert.Equal(fromOrdered.Headings.Select(h => (h.Id, h.Name, string.Join(",", h.Mentions))),
                other.Headings.Select(h => (h.Id, h.Name, string.Join(",", h.Mentions))));
        }
    }
}
