using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace SwitchTag.Core.Ids;

/// <summary>A turn's place in its interview's list of turns, counted from 0 (<see cref="Index"/>).
/// Outputs write that number: <c>mentions[].turn</c> and <c>worklist[].turn</c> of index.json (SCHEMA.md:
/// "index into <c>turns</c>"), the <c>turn</c> column of mentions.csv, worklist.csv and the decisions
/// file, the store's <c>turn</c> columns. Ordered by position; JSON carries the plain number.</summary>
[JsonConverter(typeof(TurnIdJsonConverter))]
public readonly record struct TurnId : IComparable<TurnId>
{
    public TurnId(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        Index = index;
    }

    public int Index { get; }

    public int CompareTo(TurnId other) => Index.CompareTo(other.Index);

    public static bool operator <(TurnId a, TurnId b) => a.Index < b.Index;
    public static bool operator >(TurnId a, TurnId b) => a.Index > b.Index;
    public static bool operator <=(TurnId a, TurnId b) => a.Index <= b.Index;
    public static bool operator >=(TurnId a, TurnId b) => a.Index >= b.Index;

    public override string ToString() => Index.ToString(CultureInfo.InvariantCulture);
}

/// <summary>Writes and reads a <see cref="TurnId"/> as its plain number.</summary>
public sealed class TurnIdJsonConverter : JsonConverter<TurnId>
{
    public override TurnId Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) => new(reader.GetInt32());

    public override void Write(Utf8JsonWriter writer, TurnId value, JsonSerializerOptions options) => writer.WriteNumberValue(value.Index);
}
