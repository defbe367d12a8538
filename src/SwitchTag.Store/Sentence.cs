namespace SwitchTag.Store;

/// <summary>The sentence of a turn around a match: from after the previous sentence end (., ?, ! or …
/// followed by a space) to the next one, trimmed.</summary>
public static class Sentence
{
    public static string Around(string text, int start, int end)
    {
        int from = start;
        while (from > 0 && !(IsEnd(text[from - 1]) && from < text.Length && char.IsWhiteSpace(text[from]))) from--;
        int to = Math.Max(end, from);
        while (to < text.Length && !(IsEnd(text[to]) && (to + 1 == text.Length || char.IsWhiteSpace(text[to + 1])))) to++;
        if (to < text.Length) to++;
        return text[from..to].Trim();
    }

    private static bool IsEnd(char c) => c is '.' or '?' or '!' or '…';
}
