namespace SwitchTag.Core.Text;

/// <summary>One flag per char of a text, as bits: which chars a choice among overlapping spans has
/// already taken. A bool per char would take a byte, 11 MB for one speaker turn of 200k cues, made
/// anew by every such choice.</summary>
public sealed class CharFlags(int length)
{
    private readonly ulong[] _bits = new ulong[(length + 63) >> 6];

    /// <summary>Whether any char of <c>[start, start + count)</c> is flagged.</summary>
    public bool Any(int start, int count)
    {
        for (int i = start; i < start + count; i++)
            if ((_bits[i >> 6] & (1UL << (i & 63))) != 0) return true;
        return false;
    }

    /// <summary>Flags every char of <c>[start, start + count)</c>.</summary>
    public void Set(int start, int count)
    {
        for (int i = start; i < start + count; i++) _bits[i >> 6] |= 1UL << (i & 63);
    }
}
