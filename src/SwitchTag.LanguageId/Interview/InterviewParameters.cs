namespace SwitchTag.LanguageId.Interview;

/// <summary>Numbers of the interview-level decoder (see models/langid.md, "Interview profile").
/// The defaults were fitted on the development half of the Miami Spanish-English conversations
/// (../shared/data/codeswitch/miami-dev) with <c>LangIdTools tune-speech</c>; the n-gram model
/// itself never saw that text.</summary>
/// <param name="MinShare">a language is in the profile when its share of the interview's words reaches this</param>
/// <param name="OutsideShare">the share assumed for every language outside the profile (the prior a third language must beat)</param>
/// <param name="SwitchCost">nats paid for any change of language between words</param>
/// <param name="EnterWeight">times −ln(share) added to the cost of switching into a language</param>
/// <param name="StartWeight">times ln(prior) for the first word of a turn</param>
/// <param name="Context">weight of the previous turn's last language in a turn's starting prior (the rest is the profile's shares)</param>
/// <param name="KeepKnownWords">a one-word island whose word the surrounding language's training text also has as a word stays in the surrounding language</param>
/// <param name="MinIslandWeight">a run of less word weight than this inside a turn, in a language outside the profile and the script of its neighbours, is merged into them</param>
public sealed record InterviewParameters(
    double MinShare = 0.02,
    double OutsideShare = 1e-4,
    float SwitchCost = 1.5f,
    float EnterWeight = 0.75f,
    float StartWeight = 1f,
    double Context = 0.3,
    float MinIslandWeight = 1.1f,
    bool KeepKnownWords = true)
{
    public static readonly InterviewParameters Default = new();

    /// <summary>How span and turn confidences are calibrated (<see cref="StretchCalibration.Raw"/> to fit it).</summary>
    public StretchCalibration Calibration { get; init; } = StretchCalibration.Fitted;
}
