
namespace SwitchTag.Output.Text;

/// <summary>RFC 4180 output: CRLF after every record, a field quoted when it holds a comma, a quote,
/// CR or LF, and a quote inside a quoted field doubled. A cell a spreadsheet would run as a formula is
/// neutralised as the OWASP "CSV Injection" page recommends (<see cref="Neutralise"/>). Rows go to
/// the given writer as they are made (a stream's, for a file of any length), or to a string.</summary>
public sealed class Csv(TextWriter? target = null)
{
    /// <summary>Characters that make a spreadsheet read a cell as a formula (OWASP, "CSV Injection":
    /// equals, plus, minus, at, tab, carriage return).</summary>
    private const string FormulaStarts = "=+-@\t\r";

    private readonly TextWriter _text = target ?? new StringWriter();

    public Csv Row(params string?[] fields)
    {
        for (int i = 0; i < fields.Length; i++)
        {
            if (i > 0) _text.Append(',');
            Field(fields[i] ?? "");
        }
        _text.Append("\r\n");
        return this;
    }

    /// <summary>The rows so far, when they went to a string.</summary>
    public override string ToString() => _text.ToString()!;

    /// <summary>A cell that starts with a formula character, after any apostrophes, gets one more
    /// apostrophe in front (the spreadsheet then shows it as text). Counting the apostrophes keeps the
    /// rule reversible: <see cref="Restore"/> takes exactly one off, so a text that itself began with
    /// <c>'=</c> comes back unchanged.</summary>
    public static string Neutralise(string value) => NeedsApostrophe(value, 0) ? "'" + value : value;

    /// <summary>The text a cell held before <see cref="Neutralise"/>.</summary>
    public static string Restore(string cell) => cell.StartsWith('\'') && NeedsApostrophe(cell, 1) ? cell[1..] : cell;

    private static bool NeedsApostrophe(string value, int from)
    {
        int i = from;
        while (i < value.Length && value[i] == '\'') i++;
        return i < value.Length && FormulaStarts.Contains(value[i]);
    }

    private void Field(string value)
    {
        string cell = Neutralise(value);
        // OWASP also wants a neutralised cell quoted, so no reader strips the apostrophe as padding.
        if (cell.Length == value.Length && value.AsSpan().IndexOfAny(",\"\r\n") < 0) { _text.Append(value); return; }
        _text.Append('"').Append(cell.Replace("\"", "\"\"")).Append('"');
    }
}
