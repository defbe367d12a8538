namespace SwitchTag.Lexicon;

/// <summary>Folded names (words joined by one space) in ordinal order, each with the ids of the
/// entries it names. Sorted keys give exact lookup and prefix ranges by binary search, which is
/// what inflected matching needs: a dictionary form always starts with the stem of its inflected forms.</summary>
public sealed class NameIndex
{
    private readonly string[] _keys;
    private readonly int[] _starts;
    private readonly int[] _ids;

    private NameIndex(string[] keys, int[] starts, int[] ids)
    {
        _keys = keys;
        _starts = starts;
        _ids = ids;
    }

    /// <summary>From already sorted, distinct keys and their id lists (the gazetteer file's layout).</summary>
    public static NameIndex FromSorted(string[] keys, int[] starts, int[] ids) => new(keys, starts, ids);

    public static NameIndex Build(IEnumerable<(string Key, int Id)> pairs)
    {
        var groups = pairs
            .Where(p => p.Key.Length > 0)
            .GroupBy(p => p.Key, StringComparer.Ordinal)
            .OrderBy(g => g.Key, StringComparer.Ordinal)
            .ToArray();
        var keys = new string[groups.Length];
        var starts = new int[groups.Length + 1];
        var ids = new List<int>();
        for (int i = 0; i < groups.Length; i++)
        {
            keys[i] = groups[i].Key;
            starts[i] = ids.Count;
            ids.AddRange(groups[i].Select(p => p.Id).Distinct().Order());
        }
        starts[groups.Length] = ids.Count;
        return new NameIndex(keys, starts, ids.ToArray());
    }

    public int Count => _keys.Length;

    public string KeyAt(int index) => _keys[index];

    public ReadOnlySpan<int> IdsAt(int index) => _ids.AsSpan(_starts[index], _starts[index + 1] - _starts[index]);

    /// <summary>Index of the key, or -1.</summary>
    public int IndexOf(string key)
    {
        int i = Array.BinarySearch(_keys, key, StringComparer.Ordinal);
        return i >= 0 ? i : -1;
    }

    /// <summary>The keys that start with <paramref name="prefix"/>: <c>[From, To)</c>.</summary>
    public (int From, int To) PrefixRange(string prefix)
    {
        int from = LowerBound(prefix);
        int to = from;
        while (to < _keys.Length && _keys[to].StartsWith(prefix, StringComparison.Ordinal)) to++;
        return (from, to);
    }

    private int LowerBound(string key)
    {
        int lo = 0, hi = _keys.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (string.CompareOrdinal(_keys[mid], key) < 0) lo = mid + 1;
            else hi = mid;
        }
        return lo;
    }
}
