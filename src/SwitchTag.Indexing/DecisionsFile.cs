using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing;

/// <summary>Reads the reviewers' decisions CSV (RFC 4180, header row required):
/// <c>action,interview,label,name,turn,char,value</c>. Bad rows become diagnostics with file:line and
/// are skipped; the rest still apply.</summary>
public static class DecisionsFile
{
    public static readonly ImmutableArray<string> Columns = ["action", "interview", "label", "name", "turn", "char", "value"];

    private static readonly Dictionary<string, DecisionAction> Actions = new(StringComparer.OrdinalIgnoreCase)
    {
        ["reject-mention"] = DecisionAction.RejectMention,
        ["accept-mention"] = DecisionAction.AcceptMention,
        ["relabel-mention"] = DecisionAction.RelabelMention,
        ["reject-heading"] = DecisionAction.RejectHeading,
        ["relabel-heading"] = DecisionAction.RelabelHeading,
        ["merge-headings"] = DecisionAction.MergeHeadings,
        ["rename-heading"] = DecisionAction.RenameHeading,
    };

    public static string ActionName(DecisionAction action) => Actions.First(kv => kv.Value == action).Key;

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

    public static (ImmutableArray<Decision> Decisions, ImmutableArray<Diagnostic> Problems) Parse(string path, string text)
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
                $"the header must name the columns {string.Join(',', Columns)}"));
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
            var decision = ParseRow(at, Get, out string? problem);
            if (decision is null) problems.Add(new Diagnostic(at, Severity.Error, problem!));
            else decisions.Add(decision);
        }
        return (decisions.ToImmutable(), problems.ToImmutable());
    }

    private static Decision? ParseRow(SourceLine at, Func<string, string?> get, out string? problem)
    {
        problem = null;
        string? actionText = get("action");
        if (actionText is null || !Actions.TryGetValue(actionText, out var action))
        {
            problem = $"unknown action \"{actionText}\" (expected one of {string.Join(", ", Actions.Keys)})";
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
        string? value = get("value");
        int? turn = null, charAt = null;
        bool mentionLevel = action is DecisionAction.RejectMention or DecisionAction.AcceptMention or DecisionAction.RelabelMention;
        if (mentionLevel)
        {
            if (get("interview") is null) { problem = "a mention decision needs the interview column"; return null; }
            if (!int.TryParse(get("turn"), out int t) || !int.TryParse(get("char"), out int c) || t < 0 || c < 0)
            {
                problem = "a mention decision needs the turn and char columns (whole numbers, from mentions.csv)";
                return null;
            }
            turn = t; charAt = c;
        }
        bool needsLabelValue = action is DecisionAction.RelabelMention or DecisionAction.RelabelHeading;
        if (needsLabelValue && !Enum.TryParse<NameLabel>(value, ignoreCase: true, out _))
        {
            problem = $"relabel needs a value of PER, LOC or ORG, not \"{value}\"";
            return null;
        }
        if (action is DecisionAction.MergeHeadings or DecisionAction.RenameHeading && value is null)
        {
            problem = action == DecisionAction.MergeHeadings ? "merge-headings needs the heading to merge into in the value column" : "rename-heading needs the new name in the value column";
            return null;
        }
        return new Decision(at, action, get("interview"), label, name, turn, charAt, value);
    }
}
