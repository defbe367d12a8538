namespace SwitchTag.LanguageId.Interview;

/// <summary>Turns a stretch's raw posterior (its language against all others over the stretch's
/// words, with the interview's shares as prior) into a calibrated probability that the stretch's
/// words are in that language: logistic regression on the raw log-odds (clipped to ±12), ln(words in
/// the stretch) and ln(the language's share of the interview). The raw posterior alone is close to 1
/// for almost every stretch (word evidence is not independent), so it says little; short stretches
/// and minority languages are where the errors are.</summary>
public sealed record StretchCalibration(double Bias, double LogitWeight, double WordsWeight, double ShareWeight)
{
    /// <summary>The raw posterior, unchanged.</summary>
    public static readonly StretchCalibration Raw = new(0, 1, 0, 0);

    /// <summary>Fitted by <c>LangIdTools calibrate-speech</c> on all Miami dev conversations
    /// (two-fold cross-fitted ECE 0.002 over all stretches, 0.014 over stretches outside the main
    /// language; raw 0.011 and 0.032; see models/langid.md).</summary>
    public static readonly StretchCalibration Fitted = new(1.0224, 0.4091, 0.0164, 0.3489);

    /// <summary>Below this calibrated confidence a stretch's language should be checked by a person
    /// rather than claimed. On Miami dev (cross-fitted) it sends 9% of the stretches outside the main
    /// language to checking, whose words are 75% right, and leaves claimed ones 98% right.</summary>
    public const double CheckBelow = 0.9;

    private const double MaxLogit = 12;

    public double Apply(double raw, int words, double share)
    {
        double p = Math.Clamp(raw, 1e-12, 1 - 1e-12);
        double logit = Math.Clamp(Math.Log(p / (1 - p)), -MaxLogit, MaxLogit);
        double z = Bias + LogitWeight * logit + WordsWeight * Math.Log(Math.Max(1, words)) + ShareWeight * Math.Log(Math.Max(share, 1e-6));
        return 1 / (1 + Math.Exp(-z));
    }
}
