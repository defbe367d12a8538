using System.Collections.Immutable;
using System.Text;

namespace SwitchTag.Indexing;

/// <summary>Reads RFC 4180 CSV: fields separated by commas, records by CRLF (a bare LF is accepted
/// too), fields optionally quoted with '"' and a doubled quote inside a quoted field standing for one.</summary>
public static class CsvRecords
{
    /// <summary>Each record with the 1-based line it starts on; blank lines are skipped.
    /// Returns false with <paramref name="error"/> set (and its line) when a quoted field never ends.</summary>
    public static bool TryParse(string text, out ImmutableArray<(int Line, ImmutableArray<string> Fields)> records, out (int Line, string Message)? error)
    {
        var result = ImmutableArray.CreateBuilder<(int, ImmutableArray<string>)>();
        var fields = ImmutableArray.CreateBuilder<string>();
        var field = new StringBuilder();
        int line = 1, recordLine = 1, i = 0;
        bool quoted = false, any = false;
        error = null;
        while (i < text.Length)
        {
            char c = text[i];
            if (quoted)
            {
                if (c == '"')
                {
                    if (i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i += 2; continue; }
                    quoted = false; i++; continue;
                }
                if (c == '\n') line++;
                field.Append(c); i++; continue;
            }
            switch (c)
            {
                case '"' when field.Length == 0: quoted = true; any = true; i++; break;
                case ',': fields.Add(field.ToString()); field.Clear(); any = true; i++; break;
                case '\r' when i + 1 < text.Length && text[i + 1] == '\n': i++; break;
                case '\n':
                    EndRecord();
                    line++; recordLine = line; i++;
                    break;
                default: field.Append(c); any = true; i++; break;
            }
        }
        if (quoted)
        {
            error = (recordLine, "a quoted field is not closed");
            records = result.ToImmutable();
            return false;
        }
        EndRecord();
        records = result.ToImmutable();
        return true;

        void EndRecord()
        {
            if (any || field.Length > 0)
            {
                fields.Add(field.ToString());
                result.Add((recordLine, fields.ToImmutable()));
            }
            fields.Clear(); field.Clear(); any = false;
        }
    }
}
