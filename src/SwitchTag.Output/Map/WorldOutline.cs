using System.Collections.Immutable;
using System.Globalization;
using System.Reflection;

namespace SwitchTag.Output.Map;

/// <summary>One closed outline of a country: longitudes and latitudes in degrees, and its box.</summary>
public sealed record Ring(ImmutableArray<(double Lon, double Lat)> Points, double West, double South, double East, double North);

/// <summary>Natural Earth 1:110m country outlines (public domain, via npm world-atlas; converted by
/// scripts/build-worldmap into Map/world-110m.txt and embedded).</summary>
public static class WorldOutline
{
    public static ImmutableArray<Ring> Rings { get; } = Load();

    private static ImmutableArray<Ring> Load()
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream("world-110m.txt")
            ?? throw new InvalidOperationException("the world outline is not embedded in SwitchTag.Output");
        using var reader = new StreamReader(stream);
        var rings = ImmutableArray.CreateBuilder<Ring>();
        while (reader.ReadLine() is { } line)
        {
            if (line.StartsWith('#') || line.Split('\t') is not [_, var coordinates]) continue;
            var points = coordinates.Split(' ').Select(p =>
            {
                int comma = p.IndexOf(',');
                return (int.Parse(p.AsSpan(0, comma), CultureInfo.InvariantCulture) / 10.0, int.Parse(p.AsSpan(comma + 1), CultureInfo.InvariantCulture) / 10.0);
            }).ToImmutableArray();
            rings.Add(new Ring(points, points.Min(p => p.Item1), points.Min(p => p.Item2), points.Max(p => p.Item1), points.Max(p => p.Item2)));
        }
        return rings.ToImmutable();
    }
}
