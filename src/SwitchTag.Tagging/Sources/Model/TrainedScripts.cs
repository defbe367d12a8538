using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources.Model;

/// <summary>The scripts the name model has seen in training: Latin (the UNER European treebanks,
/// NerKor, GUM, WikiGold, BTC) and Han (UNER Chinese-GSD). On other scripts (Hebrew-script Yiddish,
/// Cyrillic, Arabic...) its guesses are noise, so its mentions there are dropped and only the
/// authority list and the gazetteer name things.</summary>
public static class TrainedScripts
{
    public static bool Covers(ReadOnlySpan<char> text)
    {
        foreach (char c in text)
            if (WritingScripts.Of(c) is WritingScript.Latin or WritingScript.Han) return true;
        return false;
    }
}
