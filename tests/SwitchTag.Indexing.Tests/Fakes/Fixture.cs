using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Time;
using SwitchTag.Indexing;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>A small fixed interview run through fake stages: the input of the golden-file tests.
/// Place values are GeoNames cities15000 rows (ids 756135 Warsaw, 2988507 Paris, 4717560 Paris TX,
/// 3094802 Kraków), copied here so the golden files do not depend on the data folder.</summary>
public static class Fixture
{
    public static readonly PlaceLink Warsaw = new(756135, "Warsaw", 52.22977, 21.01178, "PL", 1702139);
    public static readonly PlaceLink Paris = new(2988507, "Paris", 48.85341, 2.3488, "FR", 2138551);
    public static readonly PlaceLink ParisTexas = new(4717560, "Paris", 33.66094, -95.55551, "US", 25171);
    public static readonly PlaceLink Krakow = new(3094802, "Kraków", 50.08333, 19.91667, "PL", 755050);

    public static FakeLexicon Lexicon() => new(new Dictionary<string, ImmutableArray<PlaceLink>>
    {
        ["warsaw"] = [Warsaw], ["warszawa"] = [Warsaw], ["warszaw"] = [Warsaw], ["warschau"] = [Warsaw], ["varsovie"] = [Warsaw],
        ["paris"] = [Paris, ParisTexas],
        ["krakow"] = [Krakow],
        ["florence"] = [new PlaceLink(3176959, "Florence", 43.76667, 11.25, "IT", 371517)],
    });

    public static FakeSegmenter Segmenter() => new(new Dictionary<string, string>
    {
        ["urodziłam"] = "pl", ["się"] = "pl", ["w"] = "pl", ["warszawie"] = "pl",
        ["mama"] = "pl", ["mówiła"] = "pl", ["dziecko"] = "pl",
        ["<script>alert(1)</script>"] = "pl", ["wir"] = "de", ["waren"] = "de", ["in"] = "en",
    });

    public static FakeTagger Tagger() => new(
    [
        ("Warszawa", NameLabel.LOC, 0.97), ("Warszawie", NameLabel.LOC, 0.93), ("Warschau", NameLabel.LOC, 0.9),
        ("Varsovie", NameLabel.LOC, 0.88), ("Paris", NameLabel.LOC, 0.95), ("Kraków", NameLabel.LOC, 0.96),
        ("Anna Nowak", NameLabel.PER, 0.99), ("Nowak", NameLabel.PER, 0.9), ("Kowalski", NameLabel.PER, 0.35),
        ("Florence", NameLabel.PER, 0.8), ("Atlantic Line", NameLabel.ORG, 0.85),
    ]);

    public static Transcript Transcript()
    {
        var cues = ImmutableArray.Create(
            Cue(1000, 5000, "Interviewer", "Anna Nowak, where were you born, and what was <script>alert(1)</script> & \"home\"?", 2),
            Cue(5500, 11000, "Anna Nowak", "I was born in Warszawa, in 1931.", 5, words: [(0, 5500), (6, 6200), (14, 7800), (24, 9000)]),
            Cue(11000, 16000, "Anna Nowak", "Urodziłam się w Warszawie. Mama mówiła: dziecko.", 8),
            Cue(16500, 21000, "Interviewer", "The Germans said Warschau, the French Varsovie, and Kowalski said Paris.", 11),
            Cue(21000, 26000, "Anna Nowak", "Wir waren in Paris, then Kraków, with Nowak and Florence, on the Atlantic Line.", 14));
        return new Transcript(new SourceInfo("fixture/anna-nowak.vtt", TranscriptFormat.WebVtt, new string('0', 64)), cues,
            [new Diagnostic(new SourceLine("fixture/anna-nowak.vtt", 7), Severity.Warning, "text outside any cue was kept as a note")]);
    }

    public static InterviewIndex Run(ImmutableArray<Decision> decisions = default) =>
        new InterviewPipeline(Segmenter(), Tagger(), new IndexBuilder(Lexicon(), decisions)).Run(Transcript(), new LanguageCode("en"));

    private static Cue Cue(long start, long end, string speaker, string text, int line, (int Offset, long Ms)[]? words = null) => new(
        new TimeRange(new Timecode(start), new Timecode(end)), speaker, speaker, text,
        (words ?? []).Select(w => new WordTime(w.Offset, new Timecode(w.Ms))).ToImmutableArray(),
        new SourceLine("fixture/anna-nowak.vtt", line), new CharSpan(0, 0));
}
