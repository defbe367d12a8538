using System.Text;

namespace SwitchTag.Output.Text;

/// <summary>Text outputs are UTF-8 without a byte order mark.</summary>
public static class Utf8Text
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    public static void Write(Stream stream, string text) => stream.Write(Utf8NoBom.GetBytes(text));

    /// <summary>A writer of the same bytes, for text written as it is made; disposing it leaves the
    /// stream open for its owner to close.</summary>
    public static StreamWriter Writer(Stream stream) => new(stream, Utf8NoBom, bufferSize: 1 << 16, leaveOpen: true);
}
