using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace SwitchTag.Core.Ids;

/// <summary>A mention's place in its interview's list of mentions (transcript order), counted from 0
/// (<see cref="Index"/>). Outputs write that number: <c>headings[].mentions</c> and <c>review[].mention</c>
/// of index.json (SCHEMA.md: "indices into <c>mentions</c>"), the report's <c>m-N</c> anchors, the
/// store's <c>mention</c> column. Ordered by position; JSON carries the plain number.</summary>
[JsonConverter(typeof(MentionIdJsonConverter))]
public readonly record struct MentionId : IComparable<MentionId>
{
    public MentionId(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        Index = index;
    }

    public int Index { get; }

    public int CompareTo(MentionId other) => Index.CompareTo(other.Index);

    public static bool operator <(MentionId a, MentionId b) => a.Index < b.Index;
    public static bool operator >(MentionId a, MentionId b) => a.Index > b.Index;
    public static bool operator <=(MentionId a, MentionId b) => a.Index <= b.Index;
    public static bool operator >=(MentionId a, MentionId b) => a.Index >= b.Index;

    public override string ToString() => Index.ToString(CultureInfo.InvariantCulture);
}

/// <summary>Writes and reads a <see cref="MentionId"/> as its plain number.</summary>
public sealed class MentionIdJsonConverter : JsonConverter<MentionId>
{
    public override MentionId Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) => new(reader.GetInt32());

    public override void Write(Utf8JsonWriter writer, MentionId value, JsonSerializerOptions options) => writer.WriteNumberValue(value.Index);
}
