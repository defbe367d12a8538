using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing.Decisions;

/// <summary>Reads the reviewers' decisions CSV (RFC 4180, header row required):
/// <c>action,interview,label,name,time,value</c>, or the first format's <c>turn</c> and <c>char</c>
/// columns in place of <c>time</c> (both read; columns in any order). Bad rows become diagnostics with file:line and
/// are skipped; the rest still apply. Each row becomes the typed record of its action
/// (<see cref="DecisionActions"/>).</summary>
public static class DecisionsFile
{
    public static readonly ImmutableArray<string> Columns = ["action", "interview", "label", "name", "time", "turn", "char", "value"];

    public static (ImmutableArray<Decision> Decisions, ImmutableArray<Diagnostic> Problems) Read(string path)
    {
        string text;
        try { text = File.ReadAllText(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return ([], [new Diagnostic(new SourceLine(path, 1), Severity.Error, $"cannot read the decisions file: {e.Message}")]);
        }
        return Parse(path, text);
    }

    public static (ImmutableArray<Decision> Decisions, ImmutableArray<Diagnostic> Problems) Parse(string path, string text, DecisionActions? actions = null)
    {
        var problems = ImmutableArray.CreateBuilder<Diagnostic>();
        var (records, csvProblems) = Rfc4180Reader.Parse(text);
        foreach (var (line, message) in csvProblems)
            problems.Add(new Diagnostic(new SourceLine(path, line), Severity.Error, message));
        if (records.IsEmpty) return ([], problems.ToImmutable());

        var header = records[0].Fields.Select(f => f.Trim().ToLowerInvariant()).ToList();
        var column = Columns.ToDictionary(c => c, c => header.IndexOf(c));
        if (column["action"] < 0 || column["name"] < 0)
        {
            problems.Add(new Diagnostic(new SourceLine(path, records[0].Line), Severity.Error,
                $"the header must name the columns action,interview,label,name,time,value"));
            return ([], problems.ToImmutable());
        }

        var decisions = ImmutableArray.CreateBuilder<Decision>();
        foreach (var (line, fields) in records.Skip(1))
        {
            var at = new SourceLine(path, line);
            string? Get(string name)
            {
                int c = column[name];
                if (c < 0 || c >= fields.Length) return null;
                string v = fields[c].Trim();
                return v.Length == 0 ? null : v;
            }
            var decision = ParseRow(at, Get, actions ?? DecisionActions.Default, out string? problem);
            if (decision is null) problems.Add(new Diagnostic(at, Severity.Error, problem!));
            else decisions.Add(decision);
        }
        return (decisions.ToImmutable(), problems.ToImmutable());
    }

    private static Decision? ParseRow(SourceLine at, Func<string, string?> get, DecisionActions actions, out string? problem)
    {
        problem = null;
        string? actionText = get("action");
        if (actions.Find(actionText) is not { } action)
        {
            problem = $"unknown action \"{actionText}\" (expected one of {string.Join(", ", actions.Names)})";
            return null;
        }
        string? name = get("name");
        if (name is null) { problem = "the name column is empty"; return null; }
        NameLabel? label = null;
        if (get("label") is { } labelText)
        {
            if (!Enum.TryParse<NameLabel>(labelText, ignoreCase: true, out var l)) { problem = $"unknown label \"{labelText}\" (PER, LOC or ORG)"; return null; }
            label = l;
        }
        return action.Parse(new DecisionRow(at, action.Name, get("interview"), label, name, get("time"), get("turn"), get("char"), get("value")), out problem);
    }
}
