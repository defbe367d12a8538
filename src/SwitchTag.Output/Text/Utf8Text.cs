using System.Text;

namespace SwitchTag.Output.Text;

/// <summary>Text outputs are UTF-8 without a byte order mark.</summary>
public static class Utf8Text
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    public static void Write(Stream stream, string text) => stream.Write(Utf8NoBom.GetBytes(text));
}
