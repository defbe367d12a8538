using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging;

/// <summary>Which source and language a gold file holds, read from its path so that many files
/// can be scored at once and reported per source and per language: the source is the name of the
/// file's folder (<c>English-EWT</c>, <c>EHRI-NER</c>), the language the first token of the file
/// name (split at <c>-</c>, <c>_</c> and <c>.</c>) that is two ASCII letters, as in
/// <c>en_ewt-ud-test.iob2</c>, <c>multileg-pl-test.tsv</c> or <c>de-test.tsv</c>; <c>und</c>
/// when there is none. scripts/train-ner writes its held-out parts as SOURCE/LANG-test.tsv.</summary>
public readonly record struct GoldFileLabel(string Source, LanguageCode Language)
{
    public static GoldFileLabel Of(string path)
    {
        var full = Path.GetFullPath(path);
        var source = Path.GetFileName(Path.GetDirectoryName(full)) is { Length: > 0 } dir ? dir : "unknown";
        var tokens = Path.GetFileName(full).Split(['-', '_', '.'], StringSplitOptions.RemoveEmptyEntries);
        var language = tokens.FirstOrDefault(t => t.Length == 2 && t.All(char.IsAsciiLetter)) is { } code ? new LanguageCode(code.ToLowerInvariant()) : LanguageCode.Undetermined;
        return new GoldFileLabel(source, language);
    }
}
