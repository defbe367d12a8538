using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Stages;

/// <summary>A guess of one language for a whole stretch.</summary>
public sealed record LanguageGuess(LanguageCode Language, double Confidence);

/// <summary>The langid stage: whole-stretch identification and switch segmentation inside a turn.</summary>
public interface ILanguageSegmenter
{
    IReadOnlyList<LanguageCode> Languages { get; }

    LanguageGuess Identify(ReadOnlySpan<char> text);

    /// <summary>Spans covering the words of <paramref name="text"/>, offsets into it; the main
    /// language is the prior the segmentation leans towards.</summary>
    ImmutableArray<LanguageSpan> Segment(string text, LanguageCode mainLanguage);

    /// <summary>All turns of one interview at once, and its main language (<paramref name="mainLanguage"/>
    /// when given). This default segments turn by turn around the language with most confident
    /// characters and knows no profile; a stage that can judge the interview as a whole overrides it.</summary>
    InterviewLanguageResult SegmentInterview(ImmutableArray<Turn> turns, LanguageCode? mainLanguage)
    {
        LanguageCode main = mainLanguage ?? MainLanguage.Detect(this, turns);
        var spans = turns.Select(t => Segment(t.Text, main)).ToImmutableArray();
        var basis = mainLanguage is not null ? MainLanguageDecision.Given
            : new MainLanguageDecision(main.IsUndetermined ? "none" : "largest-share", "characters", [], [], []);
        return new InterviewLanguageResult([], spans, main, basis);
    }
}

/// <summary>Words that are names in every language (gazetteer places, authority-list names), so a
/// language segmenter does not switch on them.</summary>
public interface INameLexicon
{
    bool IsKnownName(ReadOnlySpan<char> word);
}

/// <summary>The tag stage: names in one turn, each span routed with its language.</summary>
public interface INameTagger
{
    ImmutableArray<Mention> Tag(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans);
}

/// <summary>The time and index stages: from annotated turns to the finished interview index.</summary>
public interface IIndexBuilder
{
    InterviewIndex Build(
        Transcript transcript,
        ImmutableArray<Turn> turns,
        LanguageCode mainLanguage,
        ImmutableArray<ImmutableArray<LanguageSpan>> spans,
        ImmutableArray<Mention> mentions);
}
