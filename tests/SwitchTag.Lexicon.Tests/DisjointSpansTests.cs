using SwitchTag.Core.Documents;
using Xunit;

namespace SwitchTag.Lexicon.Tests;

/// <summary>The fast overlap checks give what checking every pair gives (the definition of interval
/// overlap for half-open ranges: a.Start &lt; b.End and b.Start &lt; a.End), on random spans.</summary>
public class DisjointSpansTests
{
    [Fact]
    public void Overlaps_agrees_with_checking_every_span()
    {
        var rng = new Random(7);
        for (int round = 0; round < 200; round++)
        {
            var spans = new List<(int Start, int End)>();
            for (int at = rng.Next(5); at < 300; at += rng.Next(1, 12))
            {
                int end = at + rng.Next(1, 8);
                spans.Add((at, end));
                at = end;
            }
            var index = new DisjointSpans(spans.OrderBy(_ => rng.Next()));
            for (int q = 0; q < 50; q++)
            {
                int start = rng.Next(320), end = start + rng.Next(1, 15);
                Assert.Equal(spans.Any(s => s.Start < end && start < s.End), index.Overlaps(start, end));
            }
        }
    }

    [Fact]
    public void Longest_first_agrees_with_checking_every_taken_match()
    {
        var rng = new Random(11);
        for (int round = 0; round < 200; round++)
        {
            var candidates = Enumerable.Range(0, rng.Next(40))
                .Select(_ => rng.Next(200) is var s ? new NameMatch(s, s + rng.Next(1, 20), NameLabel.LOC, "x", MentionSource.Gazetteer, null) : null!)
                .ToList();
            var taken = new List<NameMatch>();
            foreach (var m in candidates.OrderByDescending(m => m.Length).ThenBy(m => m.CharStart))
                if (!taken.Any(t => t.Overlaps(m))) taken.Add(m);
            Assert.Equal(taken.OrderBy(m => m.CharStart).ToArray(), NameMatchSelection.LongestFirst(candidates).ToArray());
        }
    }
}
