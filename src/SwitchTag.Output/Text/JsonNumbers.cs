using System.Text.Json;

namespace SwitchTag.Output.Text;

/// <summary>JSON numbers that may be missing: a region's coordinates are written as null, so the
/// field is always present for readers of the contract.</summary>
public static class JsonNumbers
{
    public static void WriteOrNull(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v) w.WriteNumber(name, v);
        else w.WriteNull(name);
    }
}
