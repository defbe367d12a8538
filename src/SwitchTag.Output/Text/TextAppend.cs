namespace SwitchTag.Output.Text;

/// <summary><c>StringBuilder</c>-style chained appends on a <see cref="TextWriter"/>, so the report
/// writers write straight to the output stream instead of building the whole file as a string first
/// (a single speaker turn of 200k cues made pages of hundreds of MB, held several times over). Each
/// overload formats as the <c>StringBuilder.Append</c> overload of the same type does.</summary>
public static class TextAppend
{
    public static TextWriter Append(this TextWriter w, string? value) { w.Write(value); return w; }

    public static TextWriter Append(this TextWriter w, char value) { w.Write(value); return w; }

    public static TextWriter Append(this TextWriter w, int value) { w.Write(value); return w; }

    public static TextWriter Append(this TextWriter w, long value) { w.Write(value); return w; }

    public static TextWriter Append(this TextWriter w, object? value) { w.Write(value?.ToString()); return w; }
}
