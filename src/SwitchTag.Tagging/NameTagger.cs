using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Lexicon;
using SwitchTag.Tagging.Sources;
using SwitchTag.Tagging.Sources.Authority;
using SwitchTag.Tagging.Sources.Gazetteer;
using SwitchTag.Tagging.Sources.Model;

namespace SwitchTag.Tagging;

/// <summary>The tag stage: every registered name source proposes mentions for the turn, and the
/// precedence policy decides which stand (<see cref="NamePrecedence"/>).</summary>
public sealed class NameTagger(NameSources sources, NamePrecedence? precedence = null) : INameTagger
{
    private readonly NamePrecedence _precedence = Checked(sources, precedence ?? NamePrecedence.Default);

    /// <summary>The shipped sources: the authority list and gazetteer, and in
    /// <see cref="TaggingMode.RulesThenModel"/> the model when there is one.</summary>
    public static NameTagger Create(NerModel? model = null, AuthorityList? authority = null, Lexicon.Gazetteer? gazetteer = null,
        TaggingMode mode = TaggingMode.RulesThenModel)
    {
        var sources = new NameSources()
            .Add(new AuthorityListSource(authority ?? AuthorityList.Empty))
            .Add(new GazetteerSource(gazetteer ?? Lexicon.Gazetteer.Empty));
        if (mode == TaggingMode.RulesThenModel && model is not null) sources.Add(new NameModelSource(model));
        return new NameTagger(sources);
    }

    public ImmutableArray<Mention> Tag(int turnIndex, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        return _precedence.Resolve(sources.SelectMany(s => s.Find(turnIndex, turnText, spans)));
    }

    private static NamePrecedence Checked(NameSources sources, NamePrecedence precedence)
    {
        foreach (var s in sources)
            if (!precedence.Ranks(s.Source)) throw new ArgumentException($"name source {s.Source} has no place in the precedence");
        return precedence;
    }
}
