using SwitchTag.LanguageId.Training;

namespace LangIdTools;

/// <summary>The evaluation texts per class, all from the held-out split: full lines, their first
/// two words, and single words of five or more letters (at most <see cref="MaxWords"/> per class).</summary>
public sealed record HeldOutSets(string Class, string Code, List<string> Lines, List<string> Pairs, List<string> Words)
{
    public const int MaxWords = 400;

    public static List<HeldOutSets> Build(IReadOnlyList<CorpusLine> corpus) =>
        corpus.Where(l => l.Split == Split.Evaluation)
            .GroupBy(l => l.Class).OrderBy(g => g.Key, StringComparer.Ordinal)
            .Select(g =>
            {
                var lines = g.Select(l => l.Text).ToList();
                var pairs = lines.Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries))
                    .Where(w => w.Length >= 2).Select(w => w[0] + " " + w[1]).ToList();
                var words = lines.SelectMany(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries))
                    .Select(w => w.Trim(".,;:!?\"'()[]«»„“”‘’-–—…".ToCharArray()))
                    .Where(w => w.Length >= 5 && w.All(char.IsLetter)).Take(MaxWords).ToList();
                return new HeldOutSets(g.Key, g.First().Code, lines, pairs, words);
            }).ToList();
}
