namespace SwitchTag.Core.Text;

public static class TextPosition
{
    /// <summary>Whether a word at <paramref name="start"/> opens a sentence: nothing but spaces,
    /// quotes, brackets and bracketed remarks ("[pause]") between it and the text start or a
    /// sentence-ending mark or dash.</summary>
    public static bool IsSentenceStart(string text, int start)
    {
        for (int j = start - 1; j >= 0; j--)
        {
            char c = text[j];
            if (c is ']' or ')')
            {
                int open = text.LastIndexOf(c == ']' ? '[' : '(', j);
                if (open < 0) return false;
                j = open;
                continue;
            }
            if (char.IsWhiteSpace(c) || c is '"' or '\'' or '“' or '”' or '„' or '«' or '»' or '(' or '[' or '‘' or '’' or '*') continue;
            return c is '.' or '!' or '?' or '…' or ':' or ';' or '-' or '–' or '—';
        }
        return true;
    }
}
