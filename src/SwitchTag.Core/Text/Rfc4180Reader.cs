using System.Collections.Immutable;
using System.Text;

namespace SwitchTag.Core.Text;

/// <summary>One CSV record: its fields and the 1-based line it starts on.</summary>
public sealed record CsvRecord(int Line, ImmutableArray<string> Fields);

/// <summary>CSV as RFC 4180 §2 defines it: fields separated by commas, records by line breaks
/// (CRLF, and LF or CR alone as the usual leniency); a field may be enclosed in double quotes, and
/// then may hold commas, line breaks, and quotes doubled (""). Malformed quoting yields a problem
/// for that line and the record is skipped; a quote never closed costs only the line it opens on.</summary>
public static class Rfc4180Reader
{
    public static (ImmutableArray<CsvRecord> Records, ImmutableArray<(int Line, string Message)> Problems) Parse(string text)
    {
        var records = ImmutableArray.CreateBuilder<CsvRecord>();
        var problems = ImmutableArray.CreateBuilder<(int, string)>();
        var fields = new List<string>();
        var field = new StringBuilder();
        int line = 1, recordLine = 1, i = 0;
        bool bad = false;
        if (text.Length > 0 && text[0] == '\uFEFF') i = 1;

        while (i < text.Length)
        {
            char c = text[i];
            if (c == '"' && field.Length == 0 && !bad)
            {
                int openLine = line, openAt = i;
                i++;
                bool closed = false;
                while (i < text.Length)
                {
                    char q = text[i];
                    if (q == '"')
                    {
                        if (i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i += 2; continue; }
                        i++;
                        closed = true;
                        break;
                    }
                    if (q == '\n' || (q == '\r' && (i + 1 >= text.Length || text[i + 1] != '\n'))) line++;
                    field.Append(q);
                    i++;
                }
                bool strayAfterClose = closed && i < text.Length && text[i] is not (',' or '\r' or '\n');
                if (!closed || (strayAfterClose && line > openLine))
                {
                    // A quote left open (or closed only lines later by another row's quote) would
                    // swallow the rows between; only its own line is lost, and reading resumes on
                    // the next line.
                    problems.Add((openLine, "quoted field is never closed; the rest of this line is not read"));
                    i = openAt;
                    while (i < text.Length && text[i] is not ('\r' or '\n')) i++;
                    line = openLine;
                    field.Clear();
                    bad = true;
                }
                if (i < text.Length && text[i] is not (',' or '\r' or '\n'))
                {
                    problems.Add((line, "text after a closing quote (a quote inside a field must be doubled)"));
                    bad = true;
                }
                continue;
            }
            if (c == ',') { fields.Add(field.ToString()); field.Clear(); i++; continue; }
            if (c is '\r' or '\n')
            {
                i += c == '\r' && i + 1 < text.Length && text[i + 1] == '\n' ? 2 : 1;
                EndRecord();
                line++;
                recordLine = line;
                continue;
            }
            if (c == '"' && !bad)
            {
                problems.Add((line, "quote inside an unquoted field (RFC 4180 requires the field to be quoted)"));
                bad = true;
            }
            field.Append(c);
            i++;
        }
        if (field.Length > 0 || fields.Count > 0) EndRecord();
        return (records.ToImmutable(), problems.ToImmutable());

        void EndRecord()
        {
            fields.Add(field.ToString());
            field.Clear();
            bool blank = fields.Count == 1 && fields[0].Length == 0;
            if (!bad && !blank) records.Add(new CsvRecord(recordLine, [.. fields]));
            fields.Clear();
            bad = false;
        }
    }
}
