using System.Text.Json;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output.IndexJson;
using Xunit;

namespace SwitchTag.Output.Tests;

/// <summary>index.json writes a long turn text in pieces and hands its bytes to the stream as it goes;
/// the file must be what one System.Text.Json <c>WriteString</c> of the whole text gives.</summary>
public class IndexJsonLongTextTests
{
    [Fact]
    public void A_long_turn_text_is_written_as_one_WriteString_would_write_it()
    {
        // Quotes, a backslash, a control char, a line break, and a surrogate pair (U+1F600) at every
        // 16 384-char boundary and around it, so pieces split escapes and pairs alike.
        var chars = new char[100_003];
        for (int i = 0; i < chars.Length; i++) chars[i] = "ab \"\\\u0001\nż"[i % 8];
        for (int at = 16_383; at + 1 < chars.Length; at += 16_384) { chars[at] = '\uD83D'; chars[at + 1] = '\uDE00'; }
        string text = new(chars);
        var index = Fixture.Run();
        index = index with { Turns = [index.Turns[0] with { Text = text }, .. index.Turns[1..]] };

        using var file = new MemoryStream();
        IndexJsonWriter.Write(index, file);

        using var expected = new MemoryStream();
        using (var w = new Utf8JsonWriter(expected, IndexJsonWriter.Options)) w.WriteStringValue(text);
        Assert.Contains(Convert.ToHexString(expected.ToArray()), Convert.ToHexString(file.ToArray()));
        using var json = JsonDocument.Parse(file.ToArray());
        Assert.Equal(text, json.RootElement.GetProperty("turns")[0].GetProperty("text").GetString());
    }
}
