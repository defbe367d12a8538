namespace SwitchTag.Output.Map;

/// <summary>Places map labels greedily: right of the marker, else left, above or below; a label that
/// would overlap a marker or a label already placed (or leave the map) is left out, and its marker keeps the name as a
/// tooltip. Widths are estimated (11px type, about 0.65em a character with its halo), which is enough to keep
/// neighbouring towns legible.</summary>
internal sealed class LabelPlacer(double width, double height)
{
    private readonly List<(double X0, double Y0, double X1, double Y1)> _taken = [];

    /// <summary>Keeps labels off a marker at (x, y).</summary>
    public void Reserve(double x, double y) => _taken.Add((x - 5, y - 5, x + 5, y + 5));

    /// <summary>The label's anchor point and text-anchor, or null when it fits nowhere.</summary>
    public (double X, double Y, string Anchor)? Place(double x, double y, string text)
    {
        double w = text.Length * 7.2 + 2, h = 13;
        (double X, double Y, string Anchor, double Left)[] tries =
        [
            (x + 6, y + 4, "start", x + 6),
            (x - 6, y + 4, "end", x - 6 - w),
            (x, y - 7, "middle", x - w / 2),
            (x, y + 16, "middle", x - w / 2),
        ];
        foreach (var t in tries)
        {
            var box = (t.Left, t.Y - h + 2, t.Left + w, t.Y + 2);
            if (box.Item1 < 0 || box.Item3 > width || box.Item2 < 0 || box.Item4 > height) continue;
            if (_taken.Any(o => box.Item1 < o.X1 && o.X0 < box.Item3 && box.Item2 < o.Y1 && o.Y0 < box.Item4)) continue;
            _taken.Add(box);
            return (t.X, t.Y, t.Anchor);
        }
        return null;
    }
}
