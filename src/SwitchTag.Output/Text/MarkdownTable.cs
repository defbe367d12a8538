namespace SwitchTag.Output.Text;

/// <summary>A pipe table written in chunks of at most <see cref="RowsPerChunk"/> rows, each chunk with
/// its own header: Markdig refuses a single table of many thousand rows ("depth limit exceeded"), and a
/// long interview or a large collection has that many.</summary>
public sealed class MarkdownTable(TextWriter md, string header, string separator)
{
    public const int RowsPerChunk = 1000;

    private int _rows;

    /// <summary>Starts a row: the caller appends the cells, ending with " |\n".</summary>
    public TextWriter Row()
    {
        if (_rows % RowsPerChunk == 0)
        {
            if (_rows > 0) md.Append('\n');
            md.Append(header).Append('\n').Append(separator).Append('\n');
        }
        _rows++;
        return md;
    }
}
