using System.Text.Json;
using SwitchTag.Core.Languages;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Codes from the ISO 639 tables (SIL's ISO 639-3 code tables; values from memory), and
/// JSON checked with System.Text.Json as the reference reader and writer.</summary>
public class LanguageCodeTests
{
    [Theory]
    // ISO 639-1: pl Polish, de German, yi Yiddish. ISO 639-3: hsb Upper Sorbian, which has no 639-1 code.
    [InlineData("pl")]
    [InlineData("de")]
    [InlineData("yi")]
    [InlineData("hsb")]
    public void Iso_639_codes_are_accepted_as_written(string code)
    {
        Assert.Equal(code, new LanguageCode(code).Code);
        Assert.Equal(code, new LanguageCode(code).ToString());
    }

    [Theory]
    [InlineData("")]
    [InlineData("p")]
    [InlineData("PL")] // ISO 639 codes are written in lower case; tools that shout are read with TryParse
    [InlineData("pl-PL")] // a BCP 47 tag (RFC 5646) with a region, not a bare ISO 639 code
    [InlineData("polish")]
    [InlineData("p1")]
    public void Anything_else_is_refused(string text) =>
        Assert.Throws<ArgumentException>(() => new LanguageCode(text));

    [Fact]
    public void Und_is_the_undetermined_code_and_the_default()
    {
        // ISO 639-2 and 639-3 reserve "und" for "Undetermined".
        Assert.Equal("und", LanguageCode.Undetermined.Code);
        Assert.True(new LanguageCode("und").IsUndetermined);
        Assert.Equal(LanguageCode.Undetermined, default);
        Assert.False(new LanguageCode("en").IsUndetermined);
    }

    [Fact]
    public void TryParse_reads_codes_as_people_write_them()
    {
        // ISO 639 codes are case-insensitive in BCP 47 (RFC 5646 section 2.1.1).
        Assert.True(LanguageCode.TryParse(" PL ", out var polish));
        Assert.Equal(new LanguageCode("pl"), polish);
        Assert.False(LanguageCode.TryParse("pl-PL", out _));
        Assert.False(LanguageCode.TryParse(null, out _));
    }

    [Fact]
    public void Equality_and_order_are_ordinal_on_the_code()
    {
        Assert.Equal(new LanguageCode("cs"), new LanguageCode("cs"));
        Assert.NotEqual(new LanguageCode("cs"), new LanguageCode("ces")); // 639-1 and 639-3 Czech are two codes; profiles alias them
        // Ordinal order of ASCII: "de" < "en" < "hsb" < "pl".
        string[] sorted = ["pl", "hsb", "en", "de"];
        Assert.Equal(["de", "en", "hsb", "pl"], sorted.Select(c => new LanguageCode(c)).Order().Select(c => c.Code));
    }

    [Fact]
    public void No_string_becomes_a_code_without_the_constructor_or_TryParse()
    {
        // A C# implicit conversion compiles to a static method op_Implicit (C# language reference,
        // "User-defined explicit and implicit conversion operators"): none may take a string, so a
        // misspelt code cannot slip in unchecked where a LanguageCode is wanted.
        Assert.DoesNotContain(typeof(LanguageCode).GetMethods(), m => m.Name is "op_Implicit" or "op_Explicit"
            && m.ReturnType == typeof(LanguageCode) && m.GetParameters().Single().ParameterType == typeof(string));
        Assert.Throws<ArgumentException>(() => new LanguageCode("english"));
    }

    [Fact]
    public void Json_carries_the_plain_code()
    {
        Assert.Equal("\"hsb\"", JsonSerializer.Serialize(new LanguageCode("hsb")));
        Assert.Equal(new LanguageCode("uk"), JsonSerializer.Deserialize<LanguageCode>("\"uk\""));
        var shares = new Dictionary<LanguageCode, int> { [new LanguageCode("pl")] = 3 };
        Assert.Equal("{\"pl\":3}", JsonSerializer.Serialize(shares));
    }
}
