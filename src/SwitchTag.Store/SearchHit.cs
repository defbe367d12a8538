using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Store;

/// <summary>One place in one interview where the query was found: a mention filed under a matching
/// heading (<see cref="Label"/> set), or a stretch of turn text (<see cref="Label"/> null).</summary>
/// <param name="Interview">The interview's folder name under the output folder.</param>
/// <param name="Text">The sentence of the turn that holds the match.</param>
/// <param name="Match">The matched words exactly as the transcript writes them.</param>
/// <param name="CharStart">Offset of the match in the turn's text (as in index.json).</param>
/// <param name="DistanceKm">With <see cref="NearPlace"/>: distance of the mentioned place from the nearest centre.</param>
public sealed record SearchHit(
    string Interview,
    TimeRange Time,
    string? Speaker,
    NameLabel? Label,
    string Text,
    string Match,
    LanguageCode Language,
    TurnId Turn,
    int CharStart,
    int CharEnd,
    HeadingId? HeadingId,
    string? Heading,
    PlaceLink? Place,
    double? DistanceKm)
{
    private static readonly JsonWriterOptions Options = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>One line of JSON (no line breaks), the form <c>switchtag search --json</c> prints.</summary>
    public string ToJson()
    {
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, Options))
        {
            w.WriteStartObject();
            w.WriteString("interview", Interview);
            w.WriteNumber("start", Time.Start.Milliseconds / 1000m);
            w.WriteNumber("end", Time.End.Milliseconds / 1000m);
            w.WriteString("speaker", Speaker);
            if (Label is { } label) w.WriteString("label", label.ToString()); else w.WriteNull("label");
            w.WriteString("text", Text);
            w.WriteString("match", Match);
            w.WriteString("language", Language.Code);
            w.WriteNumber("turn", Turn.Index);
            w.WriteNumber("charStart", CharStart);
            w.WriteNumber("charEnd", CharEnd);
            w.WriteString("heading", HeadingId?.Value);
            w.WriteString("headingName", Heading);
            if (Place is null) w.WriteNull("place");
            else
            {
                w.WriteStartObject("place");
                if (Place.HasGeonameId) w.WriteNumber("geonameId", Place.GeonameId); else w.WriteNull("geonameId");
                if (Place.Latitude is { } lat) w.WriteNumber("lat", lat); else w.WriteNull("lat");
                if (Place.Longitude is { } lon) w.WriteNumber("lon", lon); else w.WriteNull("lon");
                w.WriteString("country", Place.Country);
                w.WriteEndObject();
            }
            if (DistanceKm is { } km) w.WriteNumber("distanceKm", Math.Round(km, 1));
            w.WriteEndObject();
        }
        return System.Text.Encoding.UTF8.GetString(buffer.ToArray());
    }

    /// <summary>The plain-text line: interview, time, speaker, label and heading (or "text"), and the
    /// sentence on the same line.</summary>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{Interview}  {Time.Start}  {Speaker ?? "-"}  {(Label is { } l ? l + " " + Heading : "text")}{(DistanceKm is { } km ? $" ({km:0} km)" : "")}: {Text.ReplaceLineEndings(" ")}");
}
