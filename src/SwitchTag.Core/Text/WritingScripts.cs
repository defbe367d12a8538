namespace SwitchTag.Core.Text;

/// <summary>The writing scripts the stages tell apart (Unicode block ranges).</summary>
public enum WritingScript { None, Latin, Greek, Cyrillic, Hebrew, Arabic, Han, Other }

/// <summary>Which script a letter is written in, by Unicode block: one place for the gazetteer's
/// kept scripts, the segmenter's "same script" test and the tagger's trained scripts.</summary>
public static class WritingScripts
{
    public static WritingScript Of(char c)
    {
        if (!char.IsLetter(c)) return WritingScript.None;
        return c switch
        {
            <= '\u024F' => WritingScript.Latin,                      // Basic Latin, Latin-1, Latin Extended-A and -B
            >= '\u1E00' and <= '\u1EFF' => WritingScript.Latin,      // Latin Extended Additional (Vietnamese, Welsh...)
            >= '\u2C60' and <= '\u2C7F' => WritingScript.Latin,      // Latin Extended-C
            >= '\uA720' and <= '\uA7FF' => WritingScript.Latin,      // Latin Extended-D
            >= '\u0370' and <= '\u03FF' => WritingScript.Greek,      // Greek and Coptic
            >= '\u1F00' and <= '\u1FFF' => WritingScript.Greek,      // Greek Extended
            >= '\u0400' and <= '\u052F' => WritingScript.Cyrillic,   // Cyrillic and Cyrillic Supplement
            >= '\u0590' and <= '\u05FF' => WritingScript.Hebrew,
            >= '\uFB1D' and <= '\uFB4F' => WritingScript.Hebrew,     // Hebrew presentation forms
            >= '\u0600' and <= '\u06FF' => WritingScript.Arabic,
            >= '\u0750' and <= '\u077F' => WritingScript.Arabic,     // Arabic Supplement
            >= '\uFB50' and <= '\uFDFF' => WritingScript.Arabic,     // Arabic presentation forms A
            >= '\uFE70' and <= '\uFEFF' => WritingScript.Arabic,     // Arabic presentation forms B
            >= '\u3400' and <= '\u9FFF' => WritingScript.Han,        // CJK Extension A and Unified Ideographs
            >= '\uF900' and <= '\uFAFF' => WritingScript.Han,        // CJK Compatibility Ideographs
            _ => WritingScript.Other,
        };
    }

    /// <summary>The script of the first letter, or None when there is no letter.</summary>
    public static WritingScript OfFirstLetter(ReadOnlySpan<char> text)
    {
        foreach (char c in text)
            if (char.IsLetter(c)) return Of(c);
        return WritingScript.None;
    }
}
