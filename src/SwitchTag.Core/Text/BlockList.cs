namespace SwitchTag.Core.Text;

/// <summary>Items gathered in blocks that stay below the large object heap's 85,000 bytes, then
/// copied once into a list of exactly their count. A list that doubles as it fills leaves each
/// outgrown array behind; for the words of one speaker turn of two million words those are large
/// objects (2 + 4 + ... + 32 MB) that stay until a full collection.</summary>
public sealed class BlockList<T> where T : struct
{
    private const int FirstBlock = 16;
    private readonly int _maxBlock = Math.Max(FirstBlock, 80_000 / System.Runtime.CompilerServices.Unsafe.SizeOf<T>());
    private readonly List<T[]> _blocks = [];
    private int _inLast;

    public int Count { get; private set; }

    public void Add(T item)
    {
        if (_blocks.Count == 0 || _inLast == _blocks[^1].Length)
        {
            _blocks.Add(new T[_blocks.Count == 0 ? FirstBlock : Math.Min(_maxBlock, 2 * _blocks[^1].Length)]);
            _inLast = 0;
        }
        _blocks[^1][_inLast++] = item;
        Count++;
    }

    public List<T> ToList()
    {
        var list = new List<T>(Count);
        for (int b = 0; b < _blocks.Count; b++)
            list.AddRange(_blocks[b].AsSpan(0, b == _blocks.Count - 1 ? _inLast : _blocks[b].Length));
        return list;
    }
}
