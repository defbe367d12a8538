using System.Diagnostics.CodeAnalysis;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace SwitchTag.Core.Languages;

/// <summary>An ISO 639 language code as the project writes it: the ISO 639-1 two-letter code where
/// one exists, else the ISO 639-3 three-letter code, lower case. <c>und</c> (ISO 639-2/639-3
/// "undetermined") is <see cref="Undetermined"/>, and it is also what <c>default</c> holds, so an
/// unset code never reads as null. Equality is ordinal on the code; JSON carries the plain string.</summary>
[JsonConverter(typeof(LanguageCodeJsonConverter))]
public readonly struct LanguageCode : IEquatable<LanguageCode>, IComparable<LanguageCode>
{
    private const string UndeterminedCode = "und";

    private readonly string? _code;

    /// <summary>Refuses anything but two or three lower-case ASCII letters (ISO 639-1, -2, -3 form).</summary>
    public LanguageCode(string code)
    {
        ArgumentNullException.ThrowIfNull(code);
        if (!IsWellFormed(code)) throw new ArgumentException($"not an ISO 639 code (two or three lower-case letters): \"{code}\"", nameof(code));
        _code = code;
    }

    public static readonly LanguageCode Undetermined = new(UndeterminedCode);

    public string Code => _code ?? UndeterminedCode;

    public bool IsUndetermined => Code == UndeterminedCode;

    /// <summary>Reads a code written by people or other tools: surrounding space and letter case are
    /// ignored; anything else not of the ISO 639 form fails.</summary>
    public static bool TryParse([NotNullWhen(true)] string? text, out LanguageCode code)
    {
        code = default;
        if (text is null) return false;
        var lower = text.Trim().ToLowerInvariant();
        if (!IsWellFormed(lower)) return false;
        code = new LanguageCode(lower);
        return true;
    }

    private static bool IsWellFormed(string code) =>
        code.Length is 2 or 3 && code.All(char.IsAsciiLetterLower);

    public bool Equals(LanguageCode other) => string.Equals(Code, other.Code, StringComparison.Ordinal);
    public override bool Equals(object? obj) => obj is LanguageCode other && Equals(other);
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Code);
    public int CompareTo(LanguageCode other) => string.CompareOrdinal(Code, other.Code);
    public override string ToString() => Code;

    public static bool operator ==(LanguageCode a, LanguageCode b) => a.Equals(b);
    public static bool operator !=(LanguageCode a, LanguageCode b) => !a.Equals(b);

    // What is left of this round's bridge (see DEVELOPERS.md): a code still reads as its string and
    // compares with one (ordinally), so branches written against string codes keep compiling after
    // they merge. No string becomes a code without LanguageCode's constructor or TryParse, which
    // refuse what is not a code.
    public static implicit operator string(LanguageCode code) => code.Code;
    public static bool operator ==(LanguageCode a, string? b) => string.Equals(a.Code, b, StringComparison.Ordinal);
    public static bool operator !=(LanguageCode a, string? b) => !(a == b);
    public static bool operator ==(string? a, LanguageCode b) => b == a;
    public static bool operator !=(string? a, LanguageCode b) => !(b == a);
}

/// <summary>Writes and reads a <see cref="LanguageCode"/> as its plain code string.</summary>
public sealed class LanguageCodeJsonConverter : JsonConverter<LanguageCode>
{
    public override LanguageCode Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        new(reader.GetString() ?? throw new JsonException("a language code cannot be null"));

    public override void Write(Utf8JsonWriter writer, LanguageCode value, JsonSerializerOptions options) =>
        writer.WriteStringValue(value.Code);

    public override LanguageCode ReadAsPropertyName(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        new(reader.GetString()!);

    public override void WriteAsPropertyName(Utf8JsonWriter writer, LanguageCode value, JsonSerializerOptions options) =>
        writer.WritePropertyName(value.Code);
}
