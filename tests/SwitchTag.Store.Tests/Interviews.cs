using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Time;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Core.Languages;

namespace SwitchTag.Store.Tests;

/// <summary>Interviews for the store tests: the golden-file fixture (fake stages, GeoNames place
/// values), and the same turns repeated many times as one long interview.</summary>
public static class Interviews
{
    public static InterviewIndex Small() => Fixture.Run();

    public static InterviewIndex Large(int repeats)
    {
        var one = Fixture.Transcript();
        long shift = one.Cues[^1].Time.End.Milliseconds + 1000;
        var cues = Enumerable.Range(0, repeats).SelectMany(r => one.Cues.Select(c => c with
        {
            Time = new TimeRange(c.Time.Start + new Duration(r * shift), c.Time.End + new Duration(r * shift)),
            WordTimes = c.WordTimes.Select(w => w with { Time = w.Time + new Duration(r * shift) }).ToImmutableArray(),
        })).ToImmutableArray();
        var transcript = one with { Source = one.Source with { Path = "fixture/large.vtt" }, Cues = cues };
        return new InterviewPipeline(Fixture.Segmenter(), Fixture.Tagger(), new SwitchTag.Indexing.IndexBuilder(Fixture.Lexicon(), default)).Run(transcript, new LanguageCode("en"));
    }
}
