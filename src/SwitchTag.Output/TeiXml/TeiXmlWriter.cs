using System.Globalization;
using System.Text;
using System.Xml;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Output.Report;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.TeiXml;

/// <summary><c>index.tei.xml</c>: the interview as a TEI P5 transcription of speech (TEI Guidelines
/// ch. 8): a header with the source and the caution, a timeline of the cue times, one <c>&lt;u&gt;</c> per
/// turn pointing at its start and end, <c>&lt;anchor synch&gt;</c> where each later cue begins,
/// <c>&lt;foreign xml:lang&gt;</c> around stretches outside the main language, <c>&lt;persName&gt;</c>,
/// <c>&lt;placeName&gt;</c> and <c>&lt;orgName&gt;</c> around indexed mentions pointing at the heading in a
/// <c>&lt;standOff&gt;</c> list (and at GeoNames for linked places). The turn text is written whole, so the
/// text content of each <c>&lt;u&gt;</c> is the turn's text (characters XML 1.0 forbids become U+FFFD).</summary>
public sealed class TeiXmlWriter : IInterviewWriter
{
    public string FileName => "index.tei.xml";

    void IInterviewWriter.Write(InterviewIndex index, Stream stream) => Write(index, stream);

    public const string Namespace = "http://www.tei-c.org/ns/1.0";
    private const string XmlNs = "http://www.w3.org/XML/1998/namespace";

    public static void Write(InterviewIndex index, Stream stream)
    {
        var settings = new XmlWriterSettings
        {
            Encoding = new UTF8Encoding(false),
            Indent = true,
            IndentChars = "  ",
            NewLineChars = "\n",
        };
        using var w = XmlWriter.Create(stream, settings);
        var ids = new TeiIds();
        foreach (var turn in index.Turns)
            if (turn.Speaker is not null) ids.Speaker(turn.Speaker);

        w.WriteStartDocument();
        w.WriteStartElement("TEI", Namespace);
        w.WriteAttributeString("xml", "lang", XmlNs, "en");
        Header(w, index, ids);
        StandOff(w, index, ids);
        w.WriteStartElement("text");
        w.WriteAttributeString("xml", "lang", XmlNs, index.MainLanguage.Code);
        w.WriteStartElement("body");
        Timeline(w, index);
        // Each turn's mentions and each heading by id, gathered once: a per-turn or per-name scan of
        // them all would make a long interview quadratic.
        var mentionsOf = index.Mentions.Select((m, i) => (m.Mention.Turn, Id: new MentionId(i))).ToLookup(x => x.Turn, x => x.Id);
        var headings = new Dictionary<HeadingId, Heading>();
        foreach (var h in index.Headings) headings.TryAdd(h.Id, h);
        foreach (var turn in index.Turns) Utterance(w, index, turn, ids, mentionsOf[turn.Id], headings);
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndDocument();
    }

    private static void Header(XmlWriter w, InterviewIndex index, TeiIds ids)
    {
        var source = index.Transcript.Source;
        w.WriteStartElement("teiHeader");
        w.WriteStartElement("fileDesc");
        w.WriteStartElement("titleStmt");
        w.WriteElementString("title", $"Interview index: {Clean(index.Transcript.Id)}");
        w.WriteEndElement();
        w.WriteStartElement("publicationStmt");
        w.WriteElementString("p", "Machine draft made by SwitchTag; not published.");
        w.WriteEndElement();
        w.WriteStartElement("notesStmt");
        w.WriteStartElement("note");
        w.WriteAttributeString("type", "caution");
        w.WriteString(ReportMarkdownWriter.Caution.Replace("**", "", StringComparison.Ordinal));
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteStartElement("sourceDesc");
        w.WriteStartElement("recordingStmt");
        w.WriteStartElement("recording");
        w.WriteAttributeString("type", "audio");
        w.WriteAttributeString("dur", XmlConvert.ToString(TimeSpan.FromMilliseconds(index.Duration.Milliseconds)));
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteStartElement("bibl");
        w.WriteStartElement("idno");
        w.WriteAttributeString("type", "path");
        w.WriteString(Clean(source.Path));
        w.WriteEndElement();
        w.WriteStartElement("idno");
        w.WriteAttributeString("type", "sha256");
        w.WriteString(source.Sha256);
        w.WriteEndElement();
        w.WriteStartElement("note");
        w.WriteAttributeString("type", "format");
        w.WriteString(source.Format.Name);
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndElement();

        w.WriteStartElement("profileDesc");
        w.WriteStartElement("langUsage");
        foreach (var language in index.Spans.SelectMany(s => s).Select(s => s.Value.Language).Append(index.MainLanguage)
                     .Distinct().Order())
        {
            w.WriteStartElement("language");
            w.WriteAttributeString("ident", language.Code);
            if (language == index.MainLanguage) w.WriteAttributeString("role", "main");
            w.WriteEndElement();
        }
        w.WriteEndElement();
        if (ids.Speakers.Any())
        {
            w.WriteStartElement("particDesc");
            w.WriteStartElement("listPerson");
            w.WriteAttributeString("type", "speakers");
            foreach (var (speaker, id) in ids.Speakers)
            {
                w.WriteStartElement("person");
                w.WriteAttributeString("xml", "id", XmlNs, id);
                w.WriteElementString("persName", Clean(speaker));
                w.WriteEndElement();
            }
            w.WriteEndElement();
            w.WriteEndElement();
        }
        w.WriteEndElement();
        w.WriteEndElement();
    }

    /// <summary>The index headings: every person, place and organisation with its name and variants.</summary>
    private static void StandOff(XmlWriter w, InterviewIndex index, TeiIds ids)
    {
        if (index.Headings.IsEmpty) return;
        w.WriteStartElement("standOff");
        foreach (var (label, list, item, name) in new[]
                 {
                     (NameLabel.PER, "listPerson", "person", "persName"),
                     (NameLabel.LOC, "listPlace", "place", "placeName"),
                     (NameLabel.ORG, "listOrg", "org", "orgName"),
                 })
        {
            var headings = index.Headings.Where(h => h.Label == label).ToList();
            if (headings.Count == 0) continue;
            w.WriteStartElement(list);
            foreach (var h in headings)
            {
                w.WriteStartElement(item);
                w.WriteAttributeString("xml", "id", XmlNs, ids.Heading(h.Id));
                w.WriteElementString(name, Clean(h.Name));
                foreach (var variant in h.Variants.Where(v => v != h.Name))
                {
                    w.WriteStartElement(name);
                    w.WriteAttributeString("type", "variant");
                    w.WriteString(Clean(variant));
                    w.WriteEndElement();
                }
                if (h.Place is { } place)
                {
                    if (place is { Latitude: { } lat, Longitude: { } lon })
                    {
                        w.WriteStartElement("location");
                        w.WriteElementString("geo", string.Create(CultureInfo.InvariantCulture, $"{lat} {lon}"));
                        w.WriteEndElement();
                    }
                    // A place the talk put at a town carries the town's coordinates, never its GeoNames id.
                    if (h.PlaceFromContext)
                        w.WriteElementString("note", $"placed by the town named just before it: {Clean(place.Name)}, {place.Country}");
                    else if (place.HasGeonameId)
                    {
                        w.WriteStartElement("idno");
                        w.WriteAttributeString("type", "geonames");
                        w.WriteString(place.GeonameId.ToString(CultureInfo.InvariantCulture));
                        w.WriteEndElement();
                    }
                }
                w.WriteEndElement();
            }
            w.WriteEndElement();
        }
        w.WriteEndElement();
    }

    /// <summary>Every cue start and end (which include every turn's), in ms from the recording's start.</summary>
    private static void Timeline(XmlWriter w, InterviewIndex index)
    {
        w.WriteStartElement("timeline");
        w.WriteAttributeString("unit", "s");
        w.WriteAttributeString("origin", "#" + TeiIds.When(0));
        // One array of every time, sorted, each written once: no hash set and sort buffers of a long
        // interview's 400k times.
        var times = new long[2 * index.Transcript.Cues.Length + 2 * index.Turns.Length + 1];
        int n = 0;
        foreach (var c in index.Transcript.Cues) { times[n++] = c.Time.Start.Milliseconds; times[n++] = c.Time.End.Milliseconds; }
        foreach (var t in index.Turns) { times[n++] = t.Time.Start.Milliseconds; times[n++] = t.Time.End.Milliseconds; }
        Array.Sort(times);
        for (int k = 0; k < times.Length; k++)
        {
            long ms = times[k];
            if (k > 0 && ms == times[k - 1]) continue;
            w.WriteStartElement("when");
            w.WriteAttributeString("xml", "id", XmlNs, TeiIds.When(ms));
            if (ms != 0)
            {
                w.WriteAttributeString("interval", (ms / 1000m).ToString(CultureInfo.InvariantCulture));
                w.WriteAttributeString("since", "#" + TeiIds.When(0));
            }
            w.WriteEndElement();
        }
        w.WriteEndElement();
    }

    private static void Utterance(XmlWriter w, InterviewIndex index, Turn turn, TeiIds ids, IEnumerable<MentionId> mentions, Dictionary<HeadingId, Heading> headings)
    {
        w.WriteStartElement("u");
        if (turn.Speaker is not null) w.WriteAttributeString("who", "#" + ids.Speaker(turn.Speaker));
        w.WriteAttributeString("start", "#" + TeiIds.When(turn.Time.Start.Milliseconds));
        w.WriteAttributeString("end", "#" + TeiIds.When(turn.Time.End.Milliseconds));
        w.WriteAttributeString("n", turn.Id.Index.ToString(CultureInfo.InvariantCulture));
        // An empty string marks the content as mixed, so the indenting writer adds no whitespace inside.
        w.WriteString("");
        var anchors = turn.Cues.Skip(1).Select(c => (c.CharStart, Ms: index.Transcript.Cues[c.CueIndex].Time.Start.Milliseconds)).ToList();
        var elements = TeiInline.Layout(index, turn.Id, mentions);
        new UtteranceContent(w, index, turn, anchors, ids, headings).Write(0, turn.Text.Length, elements, 0, elements.Count);
        w.WriteEndElement();
    }

    private sealed class UtteranceContent(XmlWriter w, InterviewIndex index, Turn turn, List<(int At, long Ms)> anchors, TeiIds ids,
        Dictionary<HeadingId, Heading> headings)
    {
        /// <summary>The text from <paramref name="from"/> to <paramref name="to"/> with the elements
        /// <paramref name="lo"/> to <paramref name="hi"/> - 1 of the turn's layout, the ones inside it
        /// (read in place: no copy of a long turn's elements per level).</summary>
        public void Write(int from, int to, List<TeiInline.Element> elements, int lo, int hi)
        {
            int pos = from;
            for (int k = lo; k < hi;)
            {
                var e = elements[k];
                Text(pos, e.Start);
                int j = k + 1;
                while (j < hi && elements[j].Start >= e.Start && elements[j].End <= e.End) j++;
                Open(e);
                Write(e.Start, e.End, elements, k + 1, j);
                w.WriteEndElement();
                pos = e.End;
                k = j;
            }
            Text(pos, to);
        }

        private void Open(TeiInline.Element e)
        {
            if (!e.IsName)
            {
                w.WriteStartElement("foreign");
                w.WriteAttributeString("xml", "lang", XmlNs, e.Language?.Code);
                return;
            }
            var (mention, _, headingId) = index.MentionAt(e.Mention!.Value);
            var heading = headings[headingId!.Value];
            w.WriteStartElement(mention.Label switch { NameLabel.PER => "persName", NameLabel.LOC => "placeName", _ => "orgName" });
            string reference = "#" + ids.Heading(heading.Id);
            if (heading.Place is { HasGeonameId: true } place && !heading.PlaceFromContext)
                reference += " https://www.geonames.org/" + place.GeonameId.ToString(CultureInfo.InvariantCulture);
            w.WriteAttributeString("ref", reference);
        }

        private void Text(int from, int to)
        {
            int pos = from;
            // Anchors are in text order: start at the first one at or after from.
            int lo = 0, hi = anchors.Count;
            while (lo < hi)
            {
                int mid = (lo + hi) >>> 1;
                if (anchors[mid].At < from) lo = mid + 1; else hi = mid;
            }
            for (int k = lo; k < anchors.Count && anchors[k].At < to; k++)
            {
                var (at, ms) = anchors[k];
                if (at > pos) w.WriteString(Clean(turn.Text[pos..at]));
                w.WriteStartElement("anchor");
                w.WriteAttributeString("synch", "#" + TeiIds.When(ms));
                w.WriteEndElement();
                pos = at;
            }
            if (to > pos) w.WriteString(Clean(turn.Text[pos..to]));
        }
    }

    /// <summary>The text with every character XML 1.0 does not allow replaced by U+FFFD (same length).</summary>
    internal static string Clean(string text)
    {
        char[]? fixedText = null;
        for (int i = 0; i < text.Length; i++)
        {
            if (char.IsSurrogatePair(text, i)) { i++; continue; }
            if (XmlConvert.IsXmlChar(text[i])) continue;
            fixedText ??= text.ToCharArray();
            fixedText[i] = '\uFFFD';
        }
        return fixedText is null ? text : new string(fixedText);
    }
}
