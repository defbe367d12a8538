namespace SwitchTag.Core.Text;

/// <summary>The one sentence-start rule, shared by the name sources (a capital there says nothing
/// about a name) and the language segmenter (a capitalised word there is an ordinary word).</summary>
public static class TextPosition
{
    /// <summary>Whether a word at <paramref name="start"/> opens a sentence. Going back, spaces,
    /// quotes, opening brackets and whole bracketed remarks ("[pause]", "(laughs)") are passed over,
    /// as Unicode's sentence boundaries pass over closing punctuation; the word opens a sentence when
    /// that reaches the text start, a sentence-ending mark (. ! ? …), a colon or semicolon, or a dash
    /// that stands as a break (– or —, or a hyphen after a space): transcripts mark restarts and
    /// dialogue lines with dashes. A hyphen inside a word ("Jean-Pierre") is no break.</summary>
    public static bool IsSentenceStart(ReadOnlySpan<char> text, int start)
    {
        for (int j = start - 1; j >= 0; j--)
        {
            char c = text[j];
            if (c is ']' or ')')
            {
                int open = text[..j].LastIndexOf(c == ']' ? '[' : '(');
                if (open < 0) return false;
                j = open;
                continue;
            }
            if (char.IsWhiteSpace(c) || c is '"' or '\'' or '“' or '”' or '„' or '«' or '»' or '(' or '[' or '‘' or '’' or '*') continue;
            if (c == '-') return j == 0 || char.IsWhiteSpace(text[j - 1]);
            return c is '.' or '!' or '?' or '…' or ':' or ';' or '–' or '—';
        }
        return true;
    }
}
