using System.Globalization;
using System.Text;
using SwitchTag.Output.Html;

namespace SwitchTag.Output.Map;

/// <summary>A place to mark: what it is called, where, and where its marker links to.</summary>
public sealed record MapPlace(string Key, string Label, double Latitude, double Longitude, string Href);

/// <summary>Draws places on the world outline as inline SVG, framed around them: an equirectangular
/// projection with longitudes shortened by the cosine of the middle latitude, so a map of central
/// Europe is not stretched sideways. Each place is one <c>circle.place</c> with its label, linked.</summary>
public static class PlaceMap
{
    private const double Width = 800;
    private const double MaxHeight = 520;

    public static string Render(IReadOnlyList<MapPlace> places, string caption)
    {
        if (places.Count == 0) return "<p class=\"muted\">No place was linked to the gazetteer, so there is nothing to map.</p>\n";
        double west = places.Min(p => p.Longitude), east = places.Max(p => p.Longitude);
        double south = places.Min(p => p.Latitude), north = places.Max(p => p.Latitude);
        double padLon = Math.Max(3, (east - west) * 0.15), padLat = Math.Max(2, (north - south) * 0.15);
        west -= padLon; east += padLon; south -= padLat; north += padLat;
        // At least a region's worth of map around a single place, so the outline says where it is.
        Widen(ref west, ref east, 16);
        Widen(ref south, ref north, 10);
        south = Math.Max(south, -85); north = Math.Min(north, 85);
        double cos = Math.Cos((south + north) / 2 * Math.PI / 180);
        double scale = Width / ((east - west) * cos);
        double height = (north - south) * scale;
        if (height > MaxHeight)
        {
            scale = MaxHeight / (north - south);
            double spanLon = Width / (scale * cos), mid = (west + east) / 2;
            west = mid - spanLon / 2; east = mid + spanLon / 2;
            height = MaxHeight;
        }
        string X(double lon) => ((lon - west) * cos * scale).ToString("0.#", CultureInfo.InvariantCulture);
        string Y(double lat) => ((north - lat) * scale).ToString("0.#", CultureInfo.InvariantCulture);

        var svg = new StringBuilder();
        svg.Append(CultureInfo.InvariantCulture, $"<svg class=\"map\" viewBox=\"0 0 {Width:0} {height:0}\" role=\"img\" aria-label=\"{HtmlText.Esc(caption)}\">\n");
        svg.Append("<path class=\"land\" d=\"");
        foreach (var ring in WorldOutline.Rings)
        {
            if (ring.East < west || ring.West > east || ring.North < south || ring.South > north) continue;
            svg.Append('M');
            for (int i = 0; i < ring.Points.Length; i++)
                svg.Append(i == 0 ? "" : "L").Append(X(ring.Points[i].Lon)).Append(' ').Append(Y(ring.Points[i].Lat));
            svg.Append('Z');
        }
        svg.Append("\"/>\n");
        var labels = new LabelPlacer(Width, height);
        foreach (var p in places) labels.Reserve((p.Longitude - west) * cos * scale, (north - p.Latitude) * scale);
        foreach (var p in places)
        {
            double px = (p.Longitude - west) * cos * scale, py = (north - p.Latitude) * scale;
            string x = px.ToString("0.#", CultureInfo.InvariantCulture), y = py.ToString("0.#", CultureInfo.InvariantCulture);
            svg.Append("<a href=\"").Append(HtmlText.Esc(p.Href)).Append("\"><circle class=\"place\" data-key=\"").Append(HtmlText.Esc(p.Key))
               .Append("\" cx=\"").Append(x).Append("\" cy=\"").Append(y).Append("\" r=\"4.5\"><title>").Append(HtmlText.Esc(p.Label)).Append("</title></circle>");
            if (labels.Place(px, py, p.Label) is var (lx, ly, anchor))
                svg.Append("<text x=\"").Append(lx.ToString("0.#", CultureInfo.InvariantCulture)).Append("\" y=\"").Append(ly.ToString("0.#", CultureInfo.InvariantCulture))
                   .Append(anchor == "start" ? "" : "\" text-anchor=\"" + anchor).Append("\">").Append(HtmlText.Esc(p.Label)).Append("</text>");
            svg.Append("</a>\n");
        }
        svg.Append("</svg>\n<p class=\"muted\">Outlines: Natural Earth 1:110m (public domain).</p>\n");
        return svg.ToString();
    }

    private static void Widen(ref double low, ref double high, double min)
    {
        if (high - low >= min) return;
        double mid = (low + high) / 2;
        low = mid - min / 2; high = mid + min / 2;
    }
}
