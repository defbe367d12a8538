using System.Text;
using System.Xml;
using SwitchTag.Core.Ids;

namespace SwitchTag.Output.TeiXml;

/// <summary>xml:id values for the TEI file: heading ids made into NCNames (XML Namespaces 1.0: a
/// letter or underscore first, no colon or space), kept unique, and speakers numbered in order of
/// their first turn.</summary>
internal sealed class TeiIds
{
    private readonly Dictionary<HeadingId, string> _headings = [];
    private readonly Dictionary<string, string> _speakers = new(StringComparer.Ordinal);
    private readonly HashSet<string> _used = new(StringComparer.Ordinal);

    public string Heading(HeadingId headingId)
    {
        if (_headings.TryGetValue(headingId, out var id)) return id;
        var sb = new StringBuilder("h-");
        foreach (char c in headingId.Value) sb.Append(XmlConvert.IsNCNameChar(c) && c != ':' ? c : '_');
        id = sb.ToString();
        for (int k = 2; !_used.Add(id); k++) id = $"{sb}-{k}";
        _headings[headingId] = id;
        return id;
    }

    public string Speaker(string speaker)
    {
        if (!_speakers.TryGetValue(speaker, out var id)) _speakers[speaker] = id = $"spk{_speakers.Count + 1}";
        return id;
    }

    public IEnumerable<(string Speaker, string Id)> Speakers => _speakers.Select(p => (p.Key, p.Value));

    public static string When(long milliseconds) => "t" + milliseconds.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
