using System.IO.Compression;
using System.Text;
using SwitchTag.Tagging;
using Xunit;

namespace SwitchTag.Tagging.Tests;

/// <summary>The name-list table shipped with the model (models/ner.lexicon.tsv.gz).</summary>
public class NameLexiconTests
{
    [Fact]
    public void The_shipped_table_knows_gazetteer_towns_in_their_other_names()
    {
        var lexicon = NameLexicon.Load(Path.Combine(Models.Directory, "ner.lexicon.tsv.gz"));
        // GeoNames cities15000 row 756135 (Warsaw) lists Warszawa and Варшава among its alternate names.
        Assert.Contains('P', lexicon.Flags("warszawa"));
        Assert.Contains('P', lexicon.Flags(WordFeatures.Lower("Варшава")));
        Assert.Equal("", lexicon.Flags("klavier"));
    }

    [Fact]
    public void A_malformed_line_is_reported_with_its_number()
    {
        var path = Path.GetTempFileName();
        try
        {
            using (var gz = new GZipStream(File.Create(path), CompressionLevel.Fastest))
                gz.Write(Encoding.UTF8.GetBytes("kraków\tP\nbroken line\n"));
            var e = Assert.Throws<InvalidDataException>(() => NameLexicon.Load(path));
            Assert.EndsWith(":2: expected word<TAB>flags", e.Message);
        }
        finally { File.Delete(path); }
    }
}
