using System.Text;
using System.Xml;
using System.Xml.Schema;
using Xunit;

namespace SwitchTag.Store.Tests;

/// <summary>Reads an index.tei.xml with the .NET XML reader (XML 1.0 well-formedness) validating it
/// against tei-subset.xsd (see that file for why a subset), and gives the text of every u.</summary>
public static class TeiCheck
{
    private static readonly Lazy<XmlSchemaSet> Schemas = new(() =>
    {
        var set = new XmlSchemaSet { XmlResolver = new XmlUrlResolver() };
        set.Add("http://www.tei-c.org/ns/1.0", Path.Combine(AppContext.BaseDirectory, "tei-subset.xsd"));
        set.Compile();
        return set;
    });

    /// <summary>The text content of each u, in document order; fails on any well-formedness or schema error.</summary>
    public static List<string> Utterances(string path)
    {
        var problems = new List<string>();
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit, ValidationType = ValidationType.Schema, Schemas = Schemas.Value };
        settings.ValidationFlags |= XmlSchemaValidationFlags.ReportValidationWarnings;
        settings.ValidationEventHandler += (_, e) => problems.Add($"{e.Severity} line {e.Exception?.LineNumber}: {e.Message}");
        var utterances = new List<string>();
        StringBuilder? current = null;
        int depth = -1;
        using (var reader = XmlReader.Create(path, settings))
        {
            while (reader.Read())
            {
                if (reader.NodeType == XmlNodeType.Element && reader.LocalName == "u" && !reader.IsEmptyElement)
                {
                    current = new StringBuilder();
                    depth = reader.Depth;
                }
                else if (reader.NodeType == XmlNodeType.EndElement && reader.LocalName == "u" && reader.Depth == depth)
                {
                    utterances.Add(current!.ToString());
                    current = null;
                }
                else if (current is not null && reader.NodeType is XmlNodeType.Text or XmlNodeType.Whitespace or XmlNodeType.SignificantWhitespace)
                    current.Append(reader.Value);
            }
        }
        Assert.True(problems.Count == 0, string.Join("\n", problems));
        return utterances;
    }

    /// <summary>XML normalises line ends to \n (XML 1.0 section 2.11); the turn text is compared the same way.</summary>
    public static string AsXmlReads(string text) => text.Replace("\r\n", "\n").Replace('\r', '\n');
}
