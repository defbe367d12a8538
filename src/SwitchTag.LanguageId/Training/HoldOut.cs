namespace SwitchTag.LanguageId.Training;

public enum Split { Training, Calibration, Evaluation }

/// <summary>The fixed, seeded split of corpus lines: a line's share depends only on its text (FNV-1a
/// of the UTF-16 text with a fixed seed), so training, evaluation and tests agree without a list,
/// and a sentence repeated across sources always falls on the same side. 10% evaluation (never
/// trained on, never tuned on), 10% calibration (fits temperature and segmenter costs), 80% training.</summary>
public static class HoldOut
{
    public const ulong Seed = 20261201;

    public static Split Of(string line)
    {
        ulong h = 14695981039346656037UL ^ Seed;
        foreach (char c in line) h = (h ^ c) * 1099511628211UL;
        h ^= h >> 29;
        return (h % 10) switch { 0 => Split.Evaluation, 1 => Split.Calibration, _ => Split.Training };
    }
}
