using System.Collections.Immutable;
using Lingua;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace LangIdTools;

/// <summary>The reference identifier (SearchPioneer.Lingua 2.0.0), restricted to the languages both
/// it and the SwitchTag model support, answering with ISO 639-1 codes.</summary>
public sealed class LinguaReference
{
    private readonly LanguageDetector _detector;

    public IReadOnlySet<string> Codes { get; }

    public LinguaReference(IEnumerable<string> ourCodes)
    {
        var ours = ourCodes.ToHashSet();
        var common = LanguageInfo.All().Where(l => ours.Contains(Code(l))).ToArray();
        Codes = common.Select(Code).ToHashSet();
        _detector = LanguageDetectorBuilder.FromLanguages(common).WithPreloadedLanguageModels().Build();
    }

    public string Detect(string text) => Code(_detector.DetectLanguageOf(text));

    public ImmutableArray<LanguageSpan> Segment(string text) =>
        _detector.DetectMultipleLanguagesOf(text)
            .Select(r => { var (start, length) = r.Range.GetOffsetAndLength(text.Length); return new LanguageSpan(new CharSpan(start, start + length), new LanguageCode(Code(r.Language)), 1); })
            .ToImmutableArray();

    private static string Code(Language language)
    {
        var iso = LanguageInfo.IsoCode6391(language).ToString().ToLowerInvariant();
        return iso is "none" or "" ? "und" : iso;
    }
}
