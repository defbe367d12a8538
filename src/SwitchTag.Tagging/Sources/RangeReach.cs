namespace SwitchTag.Tagging.Sources;

/// <summary>Char ranges [start, end) of a turn, sorted by start with the running maximum of their
/// ends, answering "does some range start at or before <c>a</c> and end after <c>b</c>?" by binary
/// search. Many mentions of one long turn can each ask it (does a proposal overlap another source's,
/// does a place hold a title word) without a scan of every other mention, which made tagging one
/// speaker turn of many thousand names quadratic.</summary>
internal sealed class RangeReach
{
    private readonly int[] _starts;
    private readonly int[] _maxEnd;

    public RangeReach(IEnumerable<(int Start, int End)> ranges)
    {
        var sorted = ranges.OrderBy(r => r.Start).ToArray();
        _starts = new int[sorted.Length];
        _maxEnd = new int[sorted.Length];
        int max = int.MinValue;
        for (int i = 0; i < sorted.Length; i++)
        {
            _starts[i] = sorted[i].Start;
            _maxEnd[i] = max = Math.Max(max, sorted[i].End);
        }
    }

    /// <summary>Whether some range starts at or before <paramref name="atOrBefore"/> and ends after
    /// <paramref name="beyond"/>.</summary>
    public bool Reaches(int atOrBefore, int beyond)
    {
        int lo = 0, hi = _starts.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (_starts[mid] <= atOrBefore) lo = mid + 1; else hi = mid;
        }
        return lo > 0 && _maxEnd[lo - 1] > beyond;
    }

    /// <summary>Whether some range overlaps [<paramref name="start"/>, <paramref name="end"/>)
    /// (non-empty): it starts before the end and ends after the start.</summary>
    public bool Overlaps(int start, int end) => Reaches(end - 1, start);
}
