namespace SwitchTag.Core.Text;

/// <summary>The word count every output reports: a word is a run of non-space characters holding at
/// least one letter.</summary>
public static class WordCount
{
    public static int Of(string text, int start, int end)
    {
        int count = 0;
        int i = Math.Max(0, start);
        end = Math.Min(end, text.Length);
        while (i < end)
        {
            while (i < end && char.IsWhiteSpace(text[i])) i++;
            bool letter = false;
            while (i < end && !char.IsWhiteSpace(text[i])) { letter |= char.IsLetter(text[i]); i++; }
            if (letter) count++;
        }
        return count;
    }

    public static int Of(string text) => Of(text, 0, text.Length);
}
