using System.Collections.Frozen;
using SwitchTag.LanguageId.Profiles;

namespace SwitchTag.LanguageId.Interview;

/// <summary>Speaker labels that mark the interviewer, from the embedded
/// <c>Profiles/&lt;code&gt;/interviewer-labels.txt</c> of every language.</summary>
public static class InterviewerLabels
{
    private static readonly FrozenSet<string> Labels =
        ProfileFiles.Read("interviewer-labels.txt").Select(e => e.Entry).ToFrozenSet(StringComparer.OrdinalIgnoreCase);

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
