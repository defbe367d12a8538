using SwitchTag.Core.Documents;

namespace SwitchTag.Output.Report;

/// <summary>How the main language was chosen, in words for the reports (index.json's
/// <c>mainLanguageBasis</c>).</summary>
public static class MainLanguageText
{
    public static string? Basis(InterviewIndex index) => index.MainLanguageDecision?.Basis switch
    {
        null => null,
        "given" => "given with --main",
        "narrator-talk" => "from the narrators' talk time",
        "interviewer-tie-break" => "from the interviewer's talk (the narrators' two leading languages were close)",
        "all-talk" => "from all talk (no speaker could be told apart as narrator)",
        "largest-share" => "from the most confident text",
        "none" => "no language evidence",
        var other => other,
    };
}
