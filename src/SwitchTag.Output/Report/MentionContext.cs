using SwitchTag.Core.Documents;

namespace SwitchTag.Output.Report;

/// <summary>The sentence around a mention, cut from its turn's text at sentence ends (. ! ? …) and
/// at most <see cref="MaxSide"/> characters each side (at a space, with an ellipsis), so a reader sees
/// what was said about the name without opening the transcript.</summary>
public sealed record MentionContext(string Before, string Name, string After)
{
    public const int MaxSide = 110;

    public static MentionContext Of(InterviewIndex index, IndexedMention mention) => Of(index.TurnAt(mention.Mention.Turn).Text, mention.Mention);

    public static MentionContext Of(string text, Mention m)
    {
        // Each search stops one char past MaxSide, where the side is cut anyway: a text without
        // sentence ends (one 10 MB line) then costs no scan to its start or end per name.
        int start = m.CharStart;
        while (start > 0 && m.CharStart - start <= MaxSide && !EndsSentence(text, start - 1)) start--;
        bool cutBefore = m.CharStart - start > MaxSide;
        if (cutBefore) start = NextSpace(text, m.CharStart - MaxSide, m.CharStart);
        int end = m.CharEnd;
        while (end < text.Length && end - m.CharEnd <= MaxSide && !EndsSentence(text, end)) end++;
        if (end < text.Length) end++;
        bool cutAfter = end - m.CharEnd > MaxSide;
        if (cutAfter) end = PreviousSpace(text, m.CharEnd + MaxSide, m.CharEnd);
        return new MentionContext(
            (cutBefore ? "…" : "") + text[start..m.CharStart].TrimStart(),
            text[m.CharStart..m.CharEnd],
            text[m.CharEnd..end].TrimEnd() + (cutAfter ? "…" : ""));
    }

    /// <summary>Whether the char at <paramref name="i"/> ends a sentence: a stop followed by a space or the end.</summary>
    private static bool EndsSentence(string text, int i) =>
        text[i] is '.' or '!' or '?' or '…' && (i + 1 >= text.Length || char.IsWhiteSpace(text[i + 1]));

    private static int NextSpace(string text, int from, int limit)
    {
        for (int i = from; i < limit; i++) if (char.IsWhiteSpace(text[i])) return i + 1;
        return from;
    }

    private static int PreviousSpace(string text, int from, int limit)
    {
        for (int i = from; i > limit; i--) if (char.IsWhiteSpace(text[i])) return i;
        return from;
    }
}
