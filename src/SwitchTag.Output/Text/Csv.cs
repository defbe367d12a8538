using System.Text;

namespace SwitchTag.Output.Text;

/// <summary>RFC 4180 output: CRLF after every record, a field quoted when it holds a comma, a quote,
/// CR or LF, and a quote inside a quoted field doubled.</summary>
public sealed class Csv
{
    private readonly StringBuilder _text = new();

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

    public override string ToString() => _text.ToString();

    private void Field(string value)
    {
        if (value.AsSpan().IndexOfAny(",\"\r\n") < 0) { _text.Append(value); return; }
        _text.Append('"').Append(value.Replace("\"", "\"\"")).Append('"');
    }
}
