using SwitchTag.Output.TeiXml;
using Xunit;

namespace SwitchTag.Store.Tests;

public class TeiTests
{
    [Fact]
    public void The_fixture_export_is_well_formed_valid_and_holds_every_word_of_every_turn()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        string path = Path.Combine(dir.Path, "index.tei.xml");
        using (var stream = File.Create(path)) TeiXmlWriter.Write(index, stream);
        var utterances = TeiCheck.Utterances(path);
        Assert.Equal(index.Turns.Length, utterances.Count);
        for (int t = 0; t < index.Turns.Length; t++)
        {
            Assert.Equal(TeiCheck.AsXmlReads(index.Turns[t].Text), utterances[t]);
            foreach (var word in index.Turns[t].Text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries))
                Assert.Contains(word, utterances[t]);
        }
        string xml = File.ReadAllText(path);
        // TEI P5 ch. 8.3: u with who/start/end; ch. 13: placeName with ref to GeoNames (id 756135 Warsaw, cities15000).
        Assert.Contains("<placeName ref=\"#h-loc-g756135 https://www.geonames.org/756135\">Warszawie</placeName>", xml);
        Assert.Contains("<foreign xml:lang=\"de\">Wir waren</foreign>", xml);
        Assert.Contains("<u who=\"#spk2\" start=\"#t5500\" end=\"#t16000\"", xml);
    }

    [Fact]
    public void Characters_xml_forbids_do_not_break_the_file()
    {
        using var dir = new TempDir();
        var index = Interviews.Small();
        var turns = index.Turns.SetItem(0, index.Turns[0] with { Text = index.Turns[0].Text[..5] + "\u0001" + index.Turns[0].Text[6..] });
        string path = Path.Combine(dir.Path, "index.tei.xml");
        using (var stream = File.Create(path)) TeiXmlWriter.Write(index with { Turns = turns }, stream);
        Assert.Contains("\uFFFD", TeiCheck.Utterances(path)[0]);
    }
}
