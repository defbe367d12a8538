using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Output.IndexJson;

namespace SwitchTag.Output.PlacesGeoJson;

/// <summary><c>places.geojson</c>: an RFC 7946 FeatureCollection with one Point per linked place
/// heading. RFC 7946 section 3.1.1: positions are [longitude, latitude] in WGS 84.</summary>
public sealed class PlacesGeoJsonWriter : IInterviewWriter
{
    public string FileName => "places.geojson";

    void IInterviewWriter.Write(InterviewIndex index, Stream stream) => Write(index, stream);

    public static void Write(InterviewIndex index, Stream stream)
    {
        using var w = new Utf8JsonWriter(stream, IndexJsonWriter.Options);
        w.WriteStartObject();
        w.WriteString("type", "FeatureCollection");
        w.WriteStartArray("features");
        foreach (var h in index.Headings)
        {
            if (h.Place is null) continue;
            w.WriteStartObject();
            w.WriteString("type", "Feature");
            w.WriteString("id", h.Id.Value);
            // RFC 7946 section 3.2: an unlocated feature (a region without coordinates) has a null geometry.
            if (h.Place is { Longitude: { } lon, Latitude: { } lat })
            {
                w.WriteStartObject("geometry");
                w.WriteString("type", "Point");
                w.WriteStartArray("coordinates");
                w.WriteNumberValue(lon);
                w.WriteNumberValue(lat);
                w.WriteEndArray();
                w.WriteEndObject();
            }
            else w.WriteNull("geometry");
            w.WriteStartObject("properties");
            w.WriteString("interview", index.Transcript.Id);
            w.WriteString("heading", h.Id.Value);
            w.WriteString("name", h.Name);
            if (h.Place.HasGeonameId) w.WriteNumber("geonameId", h.Place.GeonameId); else w.WriteNull("geonameId");
            w.WriteString("country", h.Place.Country);
            w.WriteBoolean("placeFromContext", h.PlaceFromContext);
            if (h.Place.Region is not null) w.WriteString("region", h.Place.Region);
            w.WriteStartArray("variants");
            foreach (var v in h.Variants) w.WriteStringValue(v);
            w.WriteEndArray();
            w.WriteNumber("count", h.Mentions.Length);
            w.WriteStartArray("times");
            foreach (var m in h.Mentions) w.WriteStringValue(index.MentionAt(m).Time.Start.ToString());
            w.WriteEndArray();
            w.WriteEndObject();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }
}
