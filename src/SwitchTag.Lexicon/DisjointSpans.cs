namespace SwitchTag.Lexicon;

/// <summary>Char spans that do not overlap one another, answering "does any of them overlap
/// [start, end)?" by binary search. Checking a match against every span instead costs the product of
/// the two counts, which inside one long speaker turn (100k names) is quadratic.</summary>
public sealed class DisjointSpans
{
    private readonly int[] starts;
    private readonly int[] ends;

    public DisjointSpans(IEnumerable<(int Start, int End)> spans)
    {
        var sorted = spans.Where(s => s.End > s.Start).OrderBy(s => s.Start).ToArray();
        starts = [.. sorted.Select(s => s.Start)];
        ends = [.. sorted.Select(s => s.End)];
    }

    public bool Overlaps(int start, int end)
    {
        // Disjoint and sorted by start, so the ends are sorted too: the first span ending after
        // start is the only one that can reach into [start, end).
        int lo = 0, hi = ends.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (ends[mid] <= start) lo = mid + 1; else hi = mid;
        }
        return lo < starts.Length && starts[lo] < end;
    }
}
