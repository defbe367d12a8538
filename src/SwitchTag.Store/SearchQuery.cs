using SwitchTag.Core.Documents;

namespace SwitchTag.Store;

/// <summary>Places within <paramref name="Kilometres"/> of a place linked in the collection.</summary>
public sealed record NearPlace(string Place, double Kilometres);

/// <summary>One search: words (may be empty when <see cref="Near"/> is set) and filters.</summary>
/// <param name="Speaker">Matched against the turn's speaker, folded (case and diacritics ignored).</param>
public sealed record SearchQuery(string Text, NameLabel? Label = null, string? Language = null, string? Speaker = null, NearPlace? Near = null)
{
    /// <summary>The query <c>switchtag search</c>'s options ask for, or null and the reason in
    /// <paramref name="usage"/> when they do not make one.</summary>
    public static SearchQuery? From(string text, string? label, string? language, string? speaker, string? near, double? km, out string? usage)
    {
        usage = Check(text, label, near, km, out var only, out var radius);
        return usage is null ? new SearchQuery(text, only, language, speaker, radius) : null;
    }

    private static string? Check(string text, string? label, string? near, double? km, out NameLabel? only, out NearPlace? radius)
    {
        only = null;
        radius = null;
        if (label is not null)
        {
            if (!Enum.TryParse<NameLabel>(label, ignoreCase: true, out var parsed) || !Enum.IsDefined(parsed)) return $"--label wants PER, LOC or ORG, not \"{label}\"";
            only = parsed;
        }
        if (near is not null)
        {
            if (km is not { } r || r < 0 || double.IsNaN(r)) return "--near wants --km N (a radius of zero or more)";
            radius = new NearPlace(near, r);
        }
        else if (km is not null) return "--km goes with --near PLACE";
        return text.Trim().Length == 0 && radius is null ? "give a QUERY, or --near PLACE --km N" : null;
    }
}
