using System.Collections.Frozen;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Interview;

/// <summary>Speaker labels that mark the interviewer: <c>interviewer-labels.txt</c> of every
/// language profile (SwitchTag.Core's Languages/&lt;code&gt;/).</summary>
public static class InterviewerLabels
{
    private static readonly FrozenSet<string> Labels = LanguageProfiles.Default.InterviewerLabels;

    /// <summary>True for "Interviewer", "INT", "Q", "Entrevistadora"... (surrounding spaces, colons
    /// and a trailing number such as "Interviewer 2" ignored).</summary>
    public static bool IsInterviewer(string? label)
    {
        if (string.IsNullOrWhiteSpace(label)) return false;
        var s = label.Trim().TrimEnd(':').TrimEnd();
        int end = s.Length;
        while (end > 0 && char.IsDigit(s[end - 1])) end--;
        if (end > 0 && end < s.Length) s = s[..end].TrimEnd();
        return Labels.Contains(s);
    }
}
