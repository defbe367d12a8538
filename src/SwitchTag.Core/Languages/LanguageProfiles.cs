using System.Collections.Frozen;
using System.Collections.Immutable;
using System.Reflection;

namespace SwitchTag.Core.Languages;

/// <summary>The registry of language profiles: every Languages/&lt;code&gt;/ folder embedded in this
/// assembly. A new language is a new folder; nothing else changes.</summary>
public sealed class LanguageProfiles
{
    private readonly FrozenDictionary<string, LanguageProfile> _byCode;

    private LanguageProfiles(ImmutableArray<LanguageProfile> all)
    {
        All = all;
        var byCode = new Dictionary<string, LanguageProfile>(StringComparer.Ordinal);
        foreach (var p in all)
            foreach (var code in p.Aliases.Prepend(p.Code))
                if (!byCode.TryAdd(code.Code, p)) throw new InvalidDataException($"language code {code} is claimed by two profiles");
        _byCode = byCode.ToFrozenDictionary(StringComparer.Ordinal);
        StopWords = all.SelectMany(p => p.StopWords.Concat(p.Titles)).ToFrozenSet(StringComparer.Ordinal);
        NameParticles = all.SelectMany(p => p.NameParticles).ToFrozenSet(StringComparer.Ordinal);
        OrganisationHeads = all.SelectMany(p => p.OrganisationHeads).ToFrozenSet(StringComparer.Ordinal);
        OrganisationJoins = all.SelectMany(p => p.OrganisationJoins).ToFrozenSet(StringComparer.Ordinal);
        DemonymEndings = [.. all.SelectMany(p => p.DemonymEndings).Distinct(StringComparer.Ordinal).OrderByDescending(e => e.Length)];
        PatronymicEndings = [.. all.SelectMany(p => p.PatronymicEndings).Distinct(StringComparer.Ordinal).OrderByDescending(e => e.Length)];
        InterviewerLabels = all.SelectMany(p => p.InterviewerLabels).ToFrozenSet(StringComparer.OrdinalIgnoreCase);
    }

    /// <summary>Code of the folder whose lists hold in every language (ISO 639-2 "multiple languages").</summary>
    public static readonly LanguageCode Multiple = new("mul");

    /// <summary>Speaker labels that mark the interviewer, every language, compared ignoring case.</summary>
    public FrozenSet<string> InterviewerLabels { get; }

    /// <summary>Organisation head words and the small words inside such names, of every language
    /// (lower case): names are said across languages ("the Scuola Elementare Regina Margherita").</summary>
    public FrozenSet<string> OrganisationHeads { get; }

    public FrozenSet<string> OrganisationJoins { get; }

    /// <summary>Endings of words for the people of a place, every language, longest first.</summary>
    public ImmutableArray<string> DemonymEndings { get; }

    /// <summary>Patronymic endings of every language, longest first: a transliterated "Petrovna" in
    /// an English turn is as much a patronymic as "Петровна" in a Russian one.</summary>
    public ImmutableArray<string> PatronymicEndings { get; }

    /// <summary>Whether a word ends in a patronymic ending after a stem of two letters or more, or does
    /// so once at most <paramref name="caseLetters"/> final letters are set aside (a case form,
    /// "Петровича").</summary>
    public bool IsPatronymic(ReadOnlySpan<char> word, int caseLetters = 0)
    {
        var lower = word.ToString().ToLowerInvariant();
        for (int k = 0; k <= caseLetters && k < lower.Length; k++)
        {
            if (k > 0 && !char.IsLetter(lower[^k])) break;
            var head = lower[..^k];
            if (PatronymicEndings.Any(e => head.Length >= e.Length + 2 && head.EndsWith(e, StringComparison.Ordinal))) return true;
        }
        return false;
    }

    public static LanguageProfiles Default { get; } = FromResources(typeof(LanguageProfiles).Assembly);

    /// <summary>Every profile, ordered by code.</summary>
    public ImmutableArray<LanguageProfile> All { get; }

    /// <summary>Stop words and titles of every language (folded): a name source cannot tell which
    /// language a capitalised word is in before it knows it is a name.</summary>
    public FrozenSet<string> StopWords { get; }

    /// <summary>Name particles of every language.</summary>
    public FrozenSet<string> NameParticles { get; }

    /// <summary>The profile of a code or alias, or null.</summary>
    public LanguageProfile? For(LanguageCode language) => _byCode.GetValueOrDefault(language.Code);

    /// <summary>The profile of an ISO 639-1 or 639-3 code or alias as people write it (case and
    /// region suffix ignored: "pl-PL"), or null.</summary>
    public LanguageProfile? For(string? language)
    {
        if (string.IsNullOrWhiteSpace(language)) return null;
        var code = language.Trim();
        int dash = code.IndexOfAny(['-', '_']);
        if (dash > 0) code = code[..dash];
        return _byCode.GetValueOrDefault(code.ToLowerInvariant());
    }

    public static LanguageProfiles FromResources(Assembly assembly)
    {
        const string prefix = "Languages/";
        var files = assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(prefix, StringComparison.Ordinal) && n.Count(c => c == '/') == 2)
            .GroupBy(n => n.Split('/')[1], StringComparer.Ordinal);
        var profiles = files.OrderBy(g => g.Key, StringComparer.Ordinal).Select(g =>
        {
            string Read(string name)
            {
                using var stream = assembly.GetManifestResourceStream($"{prefix}{g.Key}/{name}");
                if (stream is null) return "";
                using var reader = new StreamReader(stream);
                return reader.ReadToEnd();
            }
            return ProfileText.Parse(g.Key, Read("aliases.txt"), Read("stopwords.txt"), Read("titles.txt"), Read("particles.txt"), Read("stemming.txt"), Read("patronymics.txt"), Read("organisations.txt"), Read("demonym-endings.txt"),
                Read("hesitations.txt"), Read("tags.txt"), Read("loanwords.txt"), Read("interviewer-labels.txt"));
        });
        return new LanguageProfiles([.. profiles]);
    }
}
