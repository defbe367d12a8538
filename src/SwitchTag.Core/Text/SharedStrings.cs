namespace SwitchTag.Core.Text;

/// <summary>One string object for short text that recurs many times: a name said in every other
/// sentence of a long turn, a speaker label on every cue, a language code or source on every stored
/// mention. Cut out one by one, each is its own copy, and they live until the interview is written:
/// the 571k mention texts of one 200k-cue turn took 40 MB. A fixed table of recent strings by hash,
/// so it never grows with the collection; a miss costs only the copy that would have been made
/// anyway. Thread-safe: a slot holds one reference, replaced whole.</summary>
public static class SharedStrings
{
    private const int Slots = 8192, MaxLength = 64;
    private static readonly string?[] Table = new string?[Slots];

    /// <summary>A string equal to <paramref name="chars"/>, the one made last time when it is still in the table.</summary>
    public static string Of(ReadOnlySpan<char> chars)
    {
        if (chars.Length > MaxLength) return chars.ToString();
        ref string? slot = ref Table[(uint)string.GetHashCode(chars) % Slots];
        var known = Volatile.Read(ref slot);
        if (known is not null && chars.SequenceEqual(known)) return known;
        var made = chars.ToString();
        Volatile.Write(ref slot, made);
        return made;
    }

    /// <summary><paramref name="text"/>, or an equal string already in the table, so the copy can go.</summary>
    public static string Of(string text)
    {
        if (text.Length > MaxLength) return text;
        ref string? slot = ref Table[(uint)string.GetHashCode(text.AsSpan()) % Slots];
        var known = Volatile.Read(ref slot);
        if (known is not null && string.Equals(text, known, StringComparison.Ordinal)) return known;
        Volatile.Write(ref slot, text);
        return text;
    }
}
