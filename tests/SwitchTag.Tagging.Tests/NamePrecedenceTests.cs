using SwitchTag.Core.Documents;
using SwitchTag.Tagging.Sources;

namespace SwitchTag.Tagging.Tests;

/// <summary>The precedence policy on its own: which of overlapping proposals stands. The spans are
/// invented offsets; what they check is the rule stated in issue 8 (an archive's list is never
/// overwritten; the model wins over the gazetteer; a new source slots in by its rank).</summary>
public class NamePrecedenceTests
{
    private static Mention M(int start, int end, MentionSource source, NameLabel label = NameLabel.LOC) =>
        new(0, start, end, new string('x', end - start), label, "en", 0.9, source);

    [Fact]
    public void AnAuthoritySpanIsNeverOverwritten()
    {
        var listed = M(0, 12, MentionSource.Authority, NameLabel.PER);
        var standing = NamePrecedence.Default.Resolve([M(0, 5, MentionSource.Model), M(6, 20, MentionSource.Model), M(0, 12, MentionSource.Gazetteer), listed]);
        Assert.Equal([listed], standing.ToArray());
    }

    [Fact]
    public void TheModelWinsOverTheGazetteerAndGazetteerMatchesElsewhereStand()
    {
        var model = M(0, 15, MentionSource.Model, NameLabel.PER);
        var elsewhere = M(20, 26, MentionSource.Gazetteer);
        var standing = NamePrecedence.Default.Resolve([M(0, 6, MentionSource.Gazetteer), elsewhere, model]);
        Assert.Equal([model, elsewhere], standing.ToArray());
    }

    [Fact]
    public void ADroppedProposalBlocksNothing()
    {
        // The model's span loses to the list; the gazetteer match it overlapped (but the list does not) stands.
        var listed = M(0, 4, MentionSource.Authority);
        var place = M(10, 16, MentionSource.Gazetteer);
        var standing = NamePrecedence.Default.Resolve([listed, M(2, 12, MentionSource.Model), place]);
        Assert.Equal([listed, place], standing.ToArray());
    }

    [Fact]
    public void AnInsertedSourceRanksWhereItIsPutAndNeverAboveAProtectedOne()
    {
        var cues = new MentionSource("person-cues");
        var policy = NamePrecedence.Default.InsertAfter(MentionSource.Model, cues).InsertBefore(MentionSource.Authority, new MentionSource("early"));
        Assert.Equal([MentionSource.Authority, new MentionSource("early"), MentionSource.Model, cues, MentionSource.Gazetteer], policy.Order.ToArray());
        var cue = M(0, 10, cues, NameLabel.PER);
        Assert.Equal([cue], policy.Resolve([M(0, 6, MentionSource.Gazetteer), cue]).ToArray());
        Assert.Equal([M(0, 6, MentionSource.Model)], policy.Resolve([M(0, 6, MentionSource.Model), cue]).ToArray());
    }

    [Fact]
    public void AnUnrankedSourceIsRefused()
    {
        Assert.Throws<ArgumentException>(() => NamePrecedence.Default.Resolve([M(0, 3, new MentionSource("unranked"))]));
    }
}
