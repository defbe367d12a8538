using System.Text;
using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Formats;
using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output;
using SwitchTag.Output.AnnotatedVtt;
using SwitchTag.Output.Collection;
using SwitchTag.Output.IndexJson;
using SwitchTag.Output.MentionsCsv;
using SwitchTag.Output.PlacesGeoJson;
using SwitchTag.Output.Review;
using SwitchTag.Output.Report;
using SwitchTag.Output.Text;
using SwitchTag.Output.WorklistCsv;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.Tests;

public class OutputTests
{
    private static string Bytes(Action<Stream> write)
    {
        using var stream = new MemoryStream();
        write(stream);
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    [Fact]
    public void Report_html_shows_transcript_markup_as_text()
    {
        var index = Fixture.Run();
        string html = ReportHtmlWriter.Render(index);
        // The fixture's worklist holds "<script>alert(1)</script>" (HTML Living Standard: text shown
        // literally must have '<' written as &lt;).
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html);
        Assert.DoesNotContain("src=", html);
        Assert.DoesNotContain("href=\"http", html);
        Assert.StartsWith("<!DOCTYPE html>", html);
    }

    [Fact]
    public void Report_opens_with_the_machine_draft_caution()
    {
        string md = ReportMarkdownWriter.Render(Fixture.Run());
        var lines = md.Split('\n');
        Assert.StartsWith("# ", lines[0]);
        Assert.StartsWith("> **Machine draft", lines[2]);
    }

    [Fact]
    public void Both_reports_show_the_headings_that_may_be_the_same_person()
    {
        var index = Fixture.Run();
        var (first, other) = (index.Headings[0], index.Headings[^1]);
        index = index with { Headings = index.Headings.SetItem(0, first with { PossiblySame = [other.Id] }) };

        // HTML Living Standard: a fragment link reaches the element whose id equals the fragment.
        string html = ReportHtmlWriter.Render(index);
        var link = System.Text.RegularExpressions.Regex.Match(html, "possibly the same person as <a href=\"#([^\"]+)\">");
        Assert.True(link.Success);
        Assert.Contains($"id=\"{link.Groups[1].Value}\"", html);

        // CommonMark 0.31 (through Markdig): the note is plain text in the heading's table cell.
        string md = ReportMarkdownWriter.Render(index);
        var row = md.Split('\n').Single(l => l.StartsWith("| **" + MarkdownText.Escape(first.Name) + "**", StringComparison.Ordinal));
        Assert.Contains("(possibly the same person as " + MarkdownText.Escape(other.Name) + ")", Markdig.Markdown.ToPlainText(row));
    }

    [Fact]
    public void Markdown_escaping_leaves_no_active_syntax()
    {
        // CommonMark 0.31 examples of active syntax: emphasis, links, raw HTML, code spans, table pipes.
        const string nasty = "*a* _b_ [x](http://e) <i>i</i> `c` | d & e";
        string html = Markdig.Markdown.ToHtml(MarkdownText.Escape(nasty));
        Assert.Equal("<p>*a* _b_ [x](http://e) &lt;i&gt;i&lt;/i&gt; `c` | d &amp; e</p>\n", html);
    }

    [Fact]
    public void Mentions_csv_parses_back_with_an_independent_rfc4180_reader()
    {
        var index = Fixture.Run();
        var rows = CsvText.Parse(MentionsCsvWriter.Render(index));
        Assert.Equal(MentionsCsvWriter.Header, rows[0]);
        Assert.Equal(index.Mentions.Length, rows.Count - 1);
        for (int i = 0; i < index.Mentions.Length; i++)
        {
            var m = index.Mentions[i];
            Assert.Equal(m.Mention.Text, rows[i + 1][5]);
            Assert.Equal(m.Time.Start.ToString(), rows[i + 1][0]);
            Assert.Equal(m.Mention.CharStart.ToString(), rows[i + 1][14]);
        }
    }

    [Fact]
    public void Worklist_csv_keeps_commas_quotes_and_newlines()
    {
        var index = Fixture.Run();
        index = index with
        {
            Worklist = [index.Worklist[0] with { Text = "a, \"quoted\"\r\nline" }, .. index.Worklist.Skip(1)],
        };
        string csv = WorklistCsvWriter.Render(index);
        Assert.EndsWith("\r\n", csv); // RFC 4180 section 2.1: each record ends with CRLF
        var rows = CsvText.Parse(csv);
        Assert.Equal(index.Worklist.Length + 1, rows.Count);
        Assert.Equal("a, \"quoted\"\r\nline", rows[1][Array.IndexOf(WorklistCsvWriter.Header, "text")]);
        Assert.All(rows, r => Assert.Equal(WorklistCsvWriter.Header.Length, r.Length));
    }

    [Fact]
    public void Worklist_csv_names_each_language_and_marks_stretches_to_check()
    {
        var index = Fixture.Run();
        index = index with { Worklist = [index.Worklist[0] with { Check = true }, .. index.Worklist.Skip(1)] };
        var rows = CsvText.Parse(WorklistCsvWriter.Render(index));
        int language = Array.IndexOf(WorklistCsvWriter.Header, "language");
        int name = Array.IndexOf(WorklistCsvWriter.Header, "language_name");
        int check = Array.IndexOf(WorklistCsvWriter.Header, "check");
        Assert.Equal(language + 1, name);
        // English names of ISO 639-1 pl and de as CLDR gives them (known from memory; CLDR en localenames).
        var expected = new Dictionary<string, string> { ["pl"] = "Polish", ["de"] = "German" };
        Assert.All(rows.Skip(1), r => Assert.Equal(expected[r[language]], r[name]));
        Assert.Equal(["yes", .. Enumerable.Repeat("no", index.Worklist.Length - 1)], rows.Skip(1).Select(r => r[check]));
    }

    [Fact]
    public void Places_geojson_is_an_rfc7946_feature_collection_with_longitude_first()
    {
        var index = Fixture.Run();
        using var doc = JsonDocument.Parse(Bytes(s => PlacesGeoJsonWriter.Write(index, s)));
        var root = doc.RootElement;
        // RFC 7946 section 3.3: a FeatureCollection has "features", an array of Feature objects.
        Assert.Equal("FeatureCollection", root.GetProperty("type").GetString());
        var features = root.GetProperty("features").EnumerateArray().ToList();
        Assert.Equal(index.Headings.Count(h => h.Place is not null), features.Count);
        foreach (var f in features)
        {
            Assert.Equal("Feature", f.GetProperty("type").GetString());
            Assert.Equal(JsonValueKind.Object, f.GetProperty("properties").ValueKind); // section 3.2: properties member
            var geometry = f.GetProperty("geometry");
            Assert.Equal(JsonValueKind.Object, geometry.ValueKind);
            Assert.Equal("Point", geometry.GetProperty("type").GetString());
            var position = geometry.GetProperty("coordinates").EnumerateArray().Select(e => e.GetDouble()).ToArray();
            Assert.Equal(2, position.Length);
            var heading = index.Headings.Single(h => h.Id.Value == f.GetProperty("id").GetString());
            // Section 3.1.1: longitude first, then latitude.
            Assert.Equal(heading.Place!.Longitude, position[0]);
            Assert.Equal(heading.Place.Latitude, position[1]);
            Assert.InRange(position[0], -180, 180);
            Assert.InRange(position[1], -90, 90);
        }
        // Warsaw from GeoNames row 756135: lon 21.01178, lat 52.22977.
        var warsaw = features.Single(f => f.GetProperty("properties").GetProperty("geonameId").GetInt64() == 756135);
        Assert.Equal(21.01178, warsaw.GetProperty("geometry").GetProperty("coordinates")[0].GetDouble());
    }

    [Fact]
    public void A_region_without_coordinates_is_an_unlocated_feature_and_null_coordinates_in_the_index()
    {
        // ISO 3166-2 code IT-78 (Calabria) as the shipped regions.tsv gives it from Debian iso-codes.
        var index = Fixture.Run();
        var first = index.Headings.First(h => h.Place is not null);
        var region = new PlaceLink(0, "Calabria", null, null, "IT", 0, "IT-78");
        index = index with { Headings = index.Headings.Replace(first, first with { Place = region }) };

        using var geo = JsonDocument.Parse(Bytes(s => PlacesGeoJsonWriter.Write(index, s)));
        var feature = geo.RootElement.GetProperty("features").EnumerateArray().Single(f => f.GetProperty("id").GetString() == first.Id.Value);
        // RFC 7946 section 3.2: "in the case that the Feature is unlocated", geometry is a JSON null.
        Assert.Equal(JsonValueKind.Null, feature.GetProperty("geometry").ValueKind);
        Assert.Equal("IT-78", feature.GetProperty("properties").GetProperty("region").GetString());

        using var json = JsonDocument.Parse(Bytes(s => IndexJsonWriter.Write(index, s)));
        var place = json.RootElement.GetProperty("headings").EnumerateArray().Single(h => h.GetProperty("id").GetString() == first.Id.Value).GetProperty("place");
        Assert.Equal(JsonValueKind.Null, place.GetProperty("lat").ValueKind);
        Assert.Equal(JsonValueKind.Null, place.GetProperty("lon").ValueKind);
        Assert.Equal("IT", place.GetProperty("country").GetString());
        Assert.Equal("IT-78", place.GetProperty("region").GetString());
        Assert.Contains("region IT-78; no coordinates", ReportMarkdownWriter.Render(index));
    }

    [Fact]
    public void Annotated_vtt_rereads_with_every_word_and_the_original_cue_times()
    {
        // The words as read: the index's transcript holds no cue texts (its turns do).
        var read = Fixture.Transcript();
        var index = Fixture.Run();
        string vtt = AnnotatedVttWriter.Render(index);
        Assert.Contains("<lang pl>Urodziłam się w Warszawie. Mama mówiła: dziecko.</lang>", vtt);
        Assert.Contains("<lang pl>&lt;script&gt;alert(1)&lt;/script&gt;</lang>", vtt);
        var reread = TranscriptFile.Parse("annotated.vtt", vtt, TranscriptFormat.WebVtt);
        Assert.True(reread.Accepted, string.Join("\n", reread.Diagnostics));
        var cues = reread.Transcript!.Cues;
        Assert.Equal(index.Transcript.Cues.Length, cues.Length);
        for (int i = 0; i < cues.Length; i++)
        {
            Assert.Equal(index.Transcript.Cues[i].Time, cues[i].Time);
            Assert.Equal(read.Cues[i].Text, cues[i].Text);
            Assert.Equal(index.Transcript.Cues[i].Speaker, cues[i].Speaker);
        }
        // The word timings survive too.
        Assert.Equal(index.Transcript.Cues[1].WordTimes.Select(w => w.Time), cues[1].WordTimes.Select(w => w.Time));
        // The stretches outside the main language are marked with W3C WebVTT <lang> spans, and the
        // re-read warns about none of them.
        Assert.Contains("<lang pl>", vtt);
        Assert.DoesNotContain(reread.Diagnostics, d => d.Message.Contains("lang", StringComparison.Ordinal));
    }

    [Fact]
    public void Reports_show_control_and_bidi_override_characters_as_marks_while_data_files_keep_them()
    {
        // Issue 11 item 13: bidi overrides and ESC passed into the reports. U+202E RIGHT-TO-LEFT
        // OVERRIDE reorders what follows it on the line ("Trojan Source", CVE-2021-42574); U+001B ESC
        // starts a terminal control sequence (ECMA-48 section 5.4). The reports show them as
        // "[U+202E]" and as U+241B SYMBOL FOR ESCAPE (Unicode Control Pictures block).
        const string speaker = "Inter\u202Eweiv\u202C\u001B[31mer";
        var t = Fixture.Transcript();
        t = t with { Cues = t.Cues.SetItem(0, t.Cues[0] with { Speaker = speaker, SpeakerLabel = speaker }) };
        var index = new InterviewPipeline(Fixture.Segmenter(), Fixture.Tagger(), new SwitchTag.Indexing.IndexBuilder(Fixture.Lexicon(), default)).Run(t, new LanguageCode("en"));
        var entries = new[] { CollectionEntry.From(index, "anna-nowak") };
        var reports = new Dictionary<string, string>
        {
            ["index.html"] = ReportHtmlWriter.Render(index),
            ["index.md"] = ReportMarkdownWriter.Render(index),
            ["review.html"] = ReviewHtmlWriter.Render(entries),
            ["collection.html"] = CollectionHtmlWriter.Render(entries),
        };
        foreach (var (name, text) in reports)
        {
            Assert.False(text.Any(c => c is '\u202E' or '\u202C' or '\u001B'), name);
            if (name != "collection.html") // the collection page names headings, not speakers
            {
                const string shown = "Inter[U+202E]weiv[U+202C]\u241B[31mer";
                Assert.Contains(name == "index.md" ? MarkdownText.Escape(shown) : shown, text); // Markdown escapes the brackets
            }
        }
        // index.json is data: its turn text and offsets stay exactly as read.
        using var json = JsonDocument.Parse(Bytes(s => IndexJsonWriter.Write(index, s)));
        Assert.Equal(speaker, json.RootElement.GetProperty("turns")[0].GetProperty("speaker").GetString());
    }

    [Fact]
    public void A_collection_of_many_interviews_still_renders()
    {
        var entry = CollectionEntry.From(Fixture.Run(), "anna-nowak");
        var entries = Enumerable.Range(0, 2500).Select(i => entry with { Interview = $"copy-{i}", Folder = $"copy-{i}" }).ToList();
        string html = CollectionHtmlWriter.Render(entries);
        Assert.Contains("href=\"copy-2499/index.html", html);
    }
}
