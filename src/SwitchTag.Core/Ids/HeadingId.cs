using System.Text.Json;
using System.Text.Json.Serialization;
using SwitchTag.Core.Documents;

namespace SwitchTag.Core.Ids;

/// <summary>A heading's stable id (<see cref="Value"/>): its label in lower case, a hyphen, then its key
/// (SCHEMA.md <c>headings[].id</c>: <c>loc-g756135</c>, <c>loc-r-it-78</c>, <c>per-anna-nowak</c>), the
/// same across interviews for the same place or key. Outputs write <see cref="Value"/> as it is
/// (index.json <c>headings[].id</c>, <c>mentions[].heading</c>, <c>possiblySame</c>; mentions.csv
/// <c>heading</c>; the store's <c>heading</c> columns). Equality and order are ordinal; JSON carries the
/// plain string.</summary>
[JsonConverter(typeof(HeadingIdJsonConverter))]
public readonly record struct HeadingId : IComparable<HeadingId>
{
    public HeadingId(string value)
    {
        ArgumentException.ThrowIfNullOrEmpty(value);
        Value = value;
    }

    public string Value { get; }

    /// <summary>The id of a heading of <paramref name="label"/> whose key, written as the id shows it, is
    /// <paramref name="key"/>.</summary>
    public static HeadingId For(NameLabel label, string key) => new($"{Prefix(label)}-{key}");

    /// <summary>The same key under another label's prefix (a relabelled heading keeps its key).</summary>
    public HeadingId WithLabel(NameLabel label) => new(Prefix(label) + Value[Value.IndexOf('-')..]);

    private static string Prefix(NameLabel label) => label.ToString().ToLowerInvariant();

    public int CompareTo(HeadingId other) => string.CompareOrdinal(Value, other.Value);

    public static bool operator <(HeadingId a, HeadingId b) => a.CompareTo(b) < 0;
    public static bool operator >(HeadingId a, HeadingId b) => a.CompareTo(b) > 0;
    public static bool operator <=(HeadingId a, HeadingId b) => a.CompareTo(b) <= 0;
    public static bool operator >=(HeadingId a, HeadingId b) => a.CompareTo(b) >= 0;

    public override string ToString() => Value;
}

/// <summary>Writes and reads a <see cref="HeadingId"/> as its plain string.</summary>
public sealed class HeadingIdJsonConverter : JsonConverter<HeadingId>
{
    public override HeadingId Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        new(reader.GetString() ?? throw new JsonException("a heading id cannot be null"));

    public override void Write(Utf8JsonWriter writer, HeadingId value, JsonSerializerOptions options) => writer.WriteStringValue(value.Value);
}
