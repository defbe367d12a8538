using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources.Model;

/// <summary>The scripts the name model has seen in training (models/ner.md): Latin (most sets),
/// Cyrillic (WikiNER and FactRuEval Russian), Hebrew (EHRI-NER Yiddish) and Han (UNER
/// Chinese-GSD). On other scripts (Greek, Arabic...) its guesses are noise, so its mentions there
/// are dropped and only the authority list and the gazetteer name things.</summary>
public static class TrainedScripts
{
    public static bool Covers(ReadOnlySpan<char> text)
    {
        foreach (char c in text)
            if (WritingScripts.Of(c) is WritingScript.Latin or WritingScript.Cyrillic or WritingScript.Hebrew or WritingScript.Han)
                return true;
        return false;
    }
}
