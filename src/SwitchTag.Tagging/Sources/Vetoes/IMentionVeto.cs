using SwitchTag.Core.Documents;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A check run on the mentions that stand after <see cref="NamePrecedence"/>: it drops a
/// mention that names nothing ("Yiddish", "Nasci" at a sentence start). Mentions of the archive's
/// list and of person cues are never vetoed: the cascade fixed them first.</summary>
public interface IMentionVeto
{
    bool Vetoes(Mention mention, string turnText);
}
