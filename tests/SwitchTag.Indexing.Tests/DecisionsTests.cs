using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Time;
using SwitchTag.Indexing.Decisions;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output.IndexJson;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests;

public class DecisionsTests
{
    // Offsets from the fixture: turn 2 is the interviewer's "The Germans said Warschau, ...", turn 3 "Wir waren in Paris, ...".
    private const string File = "action,interview,label,name,turn,char,value\r\n" +
        "merge-headings,,PER,Nowak,,,Anna Nowak\r\n" +
        "rename-heading,,LOC,Warsaw,,,Warszawa\r\n" +
        "relabel-mention,anna-nowak,,Florence,3,48,LOC\r\n" +
        "reject-heading,,ORG,Atlantic Line,,,\r\n" +
        "accept-mention,anna-nowak,,Kowalski,2,52,\r\n" +
        "reject-mention,anna-nowak,,Paris,2,66,\r\n" +
        "rename-heading,other-interview,LOC,Kraków,,,Cracow\r\n";

    private static string Json(InterviewIndex index)
    {
        using var stream = new MemoryStream();
        IndexJsonWriter.Write(index, stream);
        return System.Text.Encoding.UTF8.GetString(stream.ToArray());
    }

    [Fact]
    public void Decisions_are_applied_and_reported()
    {
        var (decisions, problems) = DecisionsFile.Parse("decisions.csv", File);
        Assert.Empty(problems);
        var index = Fixture.Run(decisions);
        Assert.Equal("Warszawa", index.Headings.Single(h => h.Place?.GeonameId == Fixture.Warsaw.GeonameId).Name);
        Assert.DoesNotContain(index.Headings, h => h.Label == NameLabel.ORG);
        Assert.Contains(index.Headings, h => h.Label == NameLabel.PER && h.Variants.Contains("Kowalski"));
        Assert.Contains(index.Headings, h => h.Label == NameLabel.LOC && h.Variants.Contains("Florence"));
        Assert.DoesNotContain(index.Mentions, m => m.Mention.Turn == new TurnId(2) && m.Mention.Text == "Paris");
        Assert.DoesNotContain(index.Headings, h => h.Name == "Cracow");
    }

    [Fact]
    public void Applying_the_decisions_file_twice_gives_the_same_index()
    {
        var (decisions, _) = DecisionsFile.Parse("decisions.csv", File);
        string once = Json(Fixture.Run(decisions));
        Assert.Equal(once, Json(Fixture.Run(decisions)));
        // The same rows twice in one file: the second copy finds nothing left to do and changes nothing.
        var (doubled, _) = DecisionsFile.Parse("decisions.csv", File + string.Join("\r\n", File.Split("\r\n").Skip(1)));
        Assert.Equal(once, Json(Fixture.Run(doubled)));
    }

    [Fact]
    public void Mention_ids_name_the_same_mentions_after_a_rejected_heading_drops_some()
    {
        // SCHEMA.md: headings[].mentions are "indices into mentions", review[].mention an "index into
        // mentions", mentions[].heading "the heading id, or null when held for review". Warsaw is named
        // first in the fixture, so rejecting it moves every later mention's id.
        var before = Fixture.Run();
        var (decisions, problems) = DecisionsFile.Parse("d.csv", "action,interview,label,name,turn,char,value\r\nreject-heading,,LOC,Warsaw,,,\r\n");
        Assert.Empty(problems);
        var after = Fixture.Run(decisions);
        var dropped = before.Headings.Single(h => h.Place?.GeonameId == Fixture.Warsaw.GeonameId).Mentions;
        Assert.Contains(before.Headings.SelectMany(h => h.Mentions).Concat(before.Review.Select(r => r.Mention)), m => m > dropped.Min() && !dropped.Contains(m));
        Assert.NotEmpty(before.Review);
        Assert.Equal(before.Mentions.Length - dropped.Length, after.Mentions.Length);

        static (string, Timecode) Said(InterviewIndex index, MentionId id) => (index.MentionAt(id).Mention.Text, index.MentionAt(id).Time.Start);
        Assert.Equal(before.Headings.Length - 1, after.Headings.Length);
        foreach (var h in after.Headings)
        {
            Assert.Equal(before.Headings.Single(b => b.Id == h.Id).Mentions.Select(m => Said(before, m)), h.Mentions.Select(m => Said(after, m)));
            Assert.All(h.Mentions, m => Assert.Equal(h.Id, after.MentionAt(m).HeadingId));
        }
        Assert.Equal(before.Review.Select(r => (Said(before, r.Mention), r.Reason)), after.Review.Select(r => (Said(after, r.Mention), r.Reason)));
        Assert.All(after.Review, r => Assert.Null(after.MentionAt(r.Mention).HeadingId));
    }

    [Fact]
    public void Outcomes_say_what_no_longer_matched()
    {
        var (decisions, _) = DecisionsFile.Parse("decisions.csv",
            "action,interview,label,name,turn,char,value\r\nreject-mention,anna-nowak,,Lisbon,0,3,\r\nrename-heading,,LOC,Paris,,,Paryż\r\n");
        var outcomes = Fixture.Run(decisions).Decisions;
        Assert.Equal(0, outcomes[0].Applied);
        Assert.Equal(1, outcomes[1].Applied);
    }

    [Fact]
    public void Bad_rows_become_diagnostics_with_their_line()
    {
        var (decisions, problems) = DecisionsFile.Parse("d.csv",
            "action,interview,label,name,turn,char,value\nexplode,,,X,,,\nrelabel-heading,,PER,X,,,PLANET\nreject-mention,,,X,1,2,\nrename-heading,,LOC,Paris,,,Paryż\n");
        Assert.Single(decisions);
        Assert.Equal([2, 3, 4], problems.Select(p => p.At.Line));
    }

    [Fact]
    public void A_mention_decision_by_time_survives_renumbered_turns_where_one_by_turn_and_char_does_not()
    {
        var paris = Fixture.Run().Mentions.Single(m => m.Mention.Turn == new TurnId(2) && m.Mention.Text == "Paris");
        string seconds = paris.Time.Start.ToSecondsString();
        var (decisions, problems) = DecisionsFile.Parse("d.csv",
            $"action,interview,label,name,time,turn,char,value\r\nreject-mention,anna-nowak,,paris,{seconds},,,\r\nreject-mention,anna-nowak,,Paris,,2,{paris.Mention.CharStart},\r\n");
        Assert.Empty(problems);

        // The same interview with one cue more at its start: every turn number moves by one, no time moves.
        var transcript = Fixture.Transcript();
        var opening = transcript.Cues[0] with { Time = new TimeRange(new Timecode(0), new Timecode(900)), Speaker = "Archivist", SpeakerLabel = "Archivist", Text = "Recording begins." };
        var shifted = transcript with { Cues = transcript.Cues.Insert(0, opening) };
        var index = new InterviewPipeline(Fixture.Segmenter(), Fixture.Tagger(), new IndexBuilder(Fixture.Lexicon(), decisions)).Run(shifted, new LanguageCode("en"));

        Assert.DoesNotContain(index.Mentions, m => m.Mention.Text == "Paris" && m.Time.Start == paris.Time.Start);
        Assert.Equal(1, index.Decisions[0].Applied);
        Assert.Equal(0, index.Decisions[1].Applied);
    }

    [Theory]
    [InlineData(-1500, 1)]
    [InlineData(-1900, 1)]
    [InlineData(-2500, 0)]
    public void A_timed_mention_decision_matches_within_two_seconds(long offsetMs, int applied)
    {
        // The fixture names Paris again in the next turn, about a second later: only the closest one is meant.
        var paris = Fixture.Run().Mentions.Single(m => m.Mention.Turn == new TurnId(2) && m.Mention.Text == "Paris");
        string seconds = (paris.Time.Start + new Duration(offsetMs)).ToSecondsString();
        var (decisions, _) = DecisionsFile.Parse("d.csv", $"action,interview,label,name,time,value\nreject-mention,anna-nowak,,Paris,{seconds},\n");
        var index = Fixture.Run(decisions);
        Assert.Equal(applied, index.Decisions.Single().Applied);
        Assert.Equal(applied == 0, index.Mentions.Any(m => m.Mention.Text == "Paris" && m.Time.Start == paris.Time.Start));
        Assert.Equal(2 - applied, index.Mentions.Count(m => m.Mention.Text == "Paris"));
    }

    [Fact]
    public void Every_decision_writes_a_row_that_reads_back_as_itself()
    {
        var (decisions, _) = DecisionsFile.Parse("d.csv", File + "reject-mention,anna-nowak,,Paris,19.25,,,\r\n");
        string rewritten = "action,interview,label,name,time,turn,char,value\r\n" + string.Concat(decisions.Select(d =>
        {
            var f = d.Fields;
            return string.Join(',', new[] { f.Action, f.Interview, f.Label, f.Name, f.Time, f.Turn, f.Char, f.Value }.Select(c => c ?? "")) + "\r\n";
        }));
        var (again, problems) = DecisionsFile.Parse("d.csv", rewritten);
        Assert.Empty(problems);
        Assert.Equal(decisions.Select(d => d.Fields), again.Select(d => d.Fields));
    }
}
