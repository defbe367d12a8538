using System.Globalization;

namespace SwitchTag.Tagging;

/// <summary>The scripts the name model has seen in training: Latin (the UNER European treebanks,
/// NerKor, GUM, WikiGold, BTC) and Han (UNER Chinese-GSD). On other scripts (Hebrew-script Yiddish,
/// Cyrillic, Arabic...) its guesses are noise, so its mentions there are dropped and only the
/// authority list and the gazetteer name things.</summary>
public static class TrainedScripts
{
    public static bool Covers(ReadOnlySpan<char> text)
    {
        foreach (char c in text)
        {
            if (!char.IsLetter(c)) continue;
            if (c <= '\u024F' || (c >= '\u1E00' && c <= '\u1EFF')) return true; // Latin blocks incl. Vietnamese
            if (char.GetUnicodeCategory(c) == UnicodeCategory.OtherLetter && c >= '\u3400' && c <= '\u9FFF') return true; // CJK ideographs
        }
        return false;
    }
}
