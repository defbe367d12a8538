using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output.IndexJson;
using SwitchTag.Tests.Shared;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.Tests;

/// <summary>index.json against its documentation (src/SwitchTag.Output/SCHEMA.md) and the contract
/// in /work/shared/DESIGN.md "Contracts".</summary>
public class SchemaTests
{
    private static JsonDocument Index()
    {
        using var stream = new MemoryStream();
        // With a recording given, so the optional media field is written too, and with a language
        // profile and a chosen (not given) main language, so their array elements are written.
        // The last linked heading is given a first-level region (ISO 3166-2 PL-12, Lesser Poland, as
        // Debian iso-codes lists it), so the region field and null coordinates are written too.
        var run = Fixture.Run();
        var last = run.Headings.Last(h => h.Place is not null);
        var headings = run.Headings.Replace(last, last with { Place = new PlaceLink(0, "Małopolskie", null, null, "PL", 0, "PL-12") });
        IndexJsonWriter.Write(run with
        {
            Headings = headings,
            Media = "../media/anna-nowak.mp3",
            LanguageProfile = [new LanguageFraction(new LanguageCode("en"), 0.8), new LanguageFraction(new LanguageCode("pl"), 0.2)],
            MainLanguageDecision = new MainLanguageDecision("narrator-talk", "seconds",
                [new LanguageFraction(new LanguageCode("en"), 0.7), new LanguageFraction(new LanguageCode("pl"), 0.3)], [new LanguageFraction(new LanguageCode("en"), 1)], ["Anna Nowak"]),
        }, stream);
        return JsonDocument.Parse(stream.ToArray());
    }

    private static void Paths(JsonElement e, string prefix, SortedSet<string> into)
    {
        switch (e.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var p in e.EnumerateObject())
                {
                    string path = prefix.Length == 0 ? p.Name : $"{prefix}.{p.Name}";
                    into.Add(path);
                    Paths(p.Value, path, into);
                }
                break;
            case JsonValueKind.Array:
                foreach (var item in e.EnumerateArray()) Paths(item, prefix + "[]", into);
                break;
        }
    }

    [Fact]
    public void Every_field_written_is_documented_and_every_documented_field_is_written()
    {
        using var doc = Index();
        var written = new SortedSet<string>(StringComparer.Ordinal);
        Paths(doc.RootElement, "", written);
        string schema = File.ReadAllText(Path.Combine(TestPaths.RepoRoot, "src", "SwitchTag.Output", "SCHEMA.md"), Encoding.UTF8);
        var section = schema[schema.IndexOf("## index.json", StringComparison.Ordinal)..];
        section = section[..section.IndexOf("\n## ", 3, StringComparison.Ordinal)];
        var documented = new SortedSet<string>(Regex.Matches(section, @"^\| `([^`]+)` \|", RegexOptions.Multiline).Select(m => m.Groups[1].Value), StringComparer.Ordinal);
        Assert.Equal(documented, written);
    }

    [Fact]
    public void The_contract_fields_are_there_with_their_types()
    {
        using var doc = Index();
        var root = doc.RootElement;
        // DESIGN.md "Contracts": the fields other tools read.
        Assert.Equal("switchtag.index/1", root.GetProperty("schema").GetString());
        Assert.Equal("webvtt", root.GetProperty("source").GetProperty("format").GetString());
        Assert.Equal(JsonValueKind.String, root.GetProperty("source").GetProperty("path").ValueKind);
        Assert.Equal(JsonValueKind.String, root.GetProperty("source").GetProperty("sha256").ValueKind);
        Assert.Equal("en", root.GetProperty("mainLanguage").GetString());
        Assert.Equal(26.0, root.GetProperty("duration").GetDouble());
        var turn = root.GetProperty("turns")[1];
        foreach (var f in new[] { "start", "end" }) Assert.Equal(JsonValueKind.Number, turn.GetProperty(f).ValueKind);
        var span = turn.GetProperty("spans")[0];
        foreach (var f in new[] { "charStart", "charEnd", "start", "end", "confidence" }) Assert.Equal(JsonValueKind.Number, span.GetProperty(f).ValueKind);
        var mention = root.GetProperty("mentions")[0];
        foreach (var f in new[] { "text", "label", "language", "source" }) Assert.Equal(JsonValueKind.String, mention.GetProperty(f).ValueKind);
        foreach (var f in new[] { "turn", "charStart", "charEnd", "start", "end", "confidence" }) Assert.Equal(JsonValueKind.Number, mention.GetProperty(f).ValueKind);
        Assert.True(mention.TryGetProperty("heading", out _));
        var heading = root.GetProperty("headings").EnumerateArray().First(h => h.GetProperty("place").ValueKind == JsonValueKind.Object);
        foreach (var f in new[] { "geonameId", "lat", "lon" }) Assert.Equal(JsonValueKind.Number, heading.GetProperty("place").GetProperty(f).ValueKind);
        Assert.Equal(JsonValueKind.Array, heading.GetProperty("variants").ValueKind);
        var item = root.GetProperty("worklist")[0];
        foreach (var f in new[] { "start", "end", "confidence" }) Assert.Equal(JsonValueKind.Number, item.GetProperty(f).ValueKind);
        // Every char offset points into its turn text, and the mention text is what is there.
        foreach (var m in root.GetProperty("mentions").EnumerateArray())
        {
            string text = root.GetProperty("turns")[m.GetProperty("turn").GetInt32()].GetProperty("text").GetString()!;
            int start = m.GetProperty("charStart").GetInt32(), end = m.GetProperty("charEnd").GetInt32();
            Assert.Equal(m.GetProperty("text").GetString(), text[start..end]);
        }
    }
}
