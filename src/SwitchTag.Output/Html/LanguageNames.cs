using System.Collections.Frozen;
using System.Reflection;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.Html;

/// <summary>English names of languages by ISO 639 code, from models/lexicon/Languages/en/language-names.tsv
/// (CLDR, cldr-localenames-full; embedded at build time). Where the list gives several names for a
/// code, the first is shown; an unknown code shows as itself.</summary>
public static class LanguageNames
{
    private static readonly FrozenDictionary<string, string> Names = Load();

    public static string Of(LanguageCode code) => code.IsUndetermined ? "undetermined" : Names.GetValueOrDefault(code.Code, code.Code);

    /// <summary>"Polish (pl)": the name and the code the JSON outputs use.</summary>
    public static string WithCode(LanguageCode code) => $"{Of(code)} ({code})";

    private static FrozenDictionary<string, string> Load()
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream("language-names.tsv")
            ?? throw new InvalidOperationException("the language names are not embedded in SwitchTag.Output");
        using var reader = new StreamReader(stream);
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        while (reader.ReadLine() is { } line)
        {
            if (line.StartsWith('#') || line.Split('\t') is not [var name, var code]) continue;
            names.TryAdd(code, name);
        }
        return names.ToFrozenDictionary();
    }
}
