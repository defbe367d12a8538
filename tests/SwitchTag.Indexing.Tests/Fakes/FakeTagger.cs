using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing.Tests.Fakes;

/// <summary>Tags fixed surfaces wherever they occur as whole words (longest first), with a fixed
/// confidence per surface; the language is that of the span the name starts in.</summary>
public sealed class FakeTagger(IReadOnlyList<(string Surface, NameLabel Label, double Confidence)> names) : INameTagger
{
    public ImmutableArray<Mention> Tag(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        var found = ImmutableArray.CreateBuilder<Mention>();
        var taken = new bool[turnText.Length];
        foreach (var (surface, label, confidence) in names.OrderByDescending(n => n.Surface.Length))
        {
            for (int at = turnText.IndexOf(surface, StringComparison.Ordinal); at >= 0; at = turnText.IndexOf(surface, at + 1, StringComparison.Ordinal))
            {
                int end = at + surface.Length;
                bool word = (at == 0 || !char.IsLetter(turnText[at - 1])) && (end == turnText.Length || !char.IsLetter(turnText[end]));
                if (!word || taken.AsSpan(at, surface.Length).Contains(true)) continue;
                taken.AsSpan(at, surface.Length).Fill(true);
                var language = spans.FirstOrDefault(s => s.Chars.Contains(at))?.Language ?? LanguageCode.Undetermined;
                found.Add(new Mention(turn, new CharSpan(at, end), surface, label, language, confidence, MentionSource.Model));
            }
        }
        return found.ToImmutable();
    }
}
