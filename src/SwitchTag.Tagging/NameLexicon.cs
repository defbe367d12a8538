using System.Collections.Frozen;
using System.IO.Compression;

namespace SwitchTag.Tagging;

/// <summary>The name-list flags the tagger was trained with (<c>ner.lexicon.tsv.gz</c>, written by
/// scripts/ner/lexicon.py next to the model): per lower-cased single word, which open lists hold it
/// (F first name, S surname, P city or town, R country or region, N language, nationality or people).
/// The file is the one the training run used, so inference looks words up in the same table.</summary>
public sealed class NameLexicon
{
    private readonly FrozenDictionary<string, string> _flags;

    private NameLexicon(FrozenDictionary<string, string> flags) => _flags = flags;

    public int Count => _flags.Count;

    /// <summary>The flags of a word already lower-cased with <see cref="WordFeatures.Lower"/>; "" when no list holds it.</summary>
    public string Flags(string lowerWord) => _flags.GetValueOrDefault(lowerWord, "");

    /// <summary>Reads <c>word TAB flags</c> lines from a gzip file; a malformed line is an error with its line number.</summary>
    public static NameLexicon Load(string path)
    {
        var flags = new Dictionary<string, string>(StringComparer.Ordinal);
        using var reader = new StreamReader(new GZipStream(File.OpenRead(path), CompressionMode.Decompress));
        int lineNo = 0;
        for (string? line; (line = reader.ReadLine()) is not null;)
        {
            lineNo++;
            int tab = line.IndexOf('\t');
            if (tab <= 0 || tab == line.Length - 1)
                throw new InvalidDataException($"{path}:{lineNo}: expected word<TAB>flags");
            flags[line[..tab]] = line[(tab + 1)..];
        }
        return new NameLexicon(flags.ToFrozenDictionary(StringComparer.Ordinal));
    }
}
