using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Files;

namespace SwitchTag.Pipeline.Collection;

/// <summary>Which interview of a run each decision means. The interview column holds an interview id
/// (<see cref="InterviewIds"/>, what review.html writes); a value that is no id of the run but the file
/// name (without extension) of exactly one input means that input, so a file written before ids were
/// paths still applies. A file name shared by several inputs names none of them: the decision is
/// refused with file:line, since applying it to all would act on interviews the reviewer never saw.</summary>
public static class DecisionTargets
{
    /// <summary>The decisions with their interview column set to an id where a file name stood (the
    /// others unchanged, the same instances), and an error for each ambiguous one, which is left out.</summary>
    public static (ImmutableArray<Decision> Decisions, ImmutableArray<Diagnostic> Problems) Resolve(
        ImmutableArray<Decision> decisions, IReadOnlyList<InputFile> files, ImmutableArray<string> ids)
    {
        if (decisions.IsDefaultOrEmpty) return (decisions.IsDefault ? [] : decisions, []);
        var known = ids.ToHashSet(StringComparer.OrdinalIgnoreCase);
        var byName = files.Select((f, i) => (Name: Path.GetFileNameWithoutExtension(f.Path), Id: ids[i]))
            .ToLookup(x => x.Name, x => x.Id, StringComparer.OrdinalIgnoreCase);
        var kept = ImmutableArray.CreateBuilder<Decision>(decisions.Length);
        var problems = ImmutableArray.CreateBuilder<Diagnostic>();
        foreach (var d in decisions)
        {
            if (d.Interview is not { } interview || known.Contains(interview)) { kept.Add(d); continue; }
            var named = byName[interview].ToList();
            switch (named.Count)
            {
                case 0: kept.Add(d); break; // reported later as matching nothing
                case 1: kept.Add(d with { Interview = named[0] }); break;
                default:
                    problems.Add(new Diagnostic(d.At, Severity.Error,
                        $"interview \"{interview}\" is the file name of {named.Count} interviews ({string.Join(", ", named)}); write the id of the one meant in the interview column"));
                    break;
            }
        }
        return (kept.ToImmutable(), problems.ToImmutable());
    }
}
