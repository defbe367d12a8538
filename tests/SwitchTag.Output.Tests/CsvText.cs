using Microsoft.VisualBasic.FileIO;

namespace SwitchTag.Output.Tests;

/// <summary>Parses CSV text with Microsoft.VisualBasic.FileIO.TextFieldParser, the .NET runtime's own
/// CSV reader, as the outside check for the CSV writers.</summary>
internal static class CsvText
{
    public static List<string[]> Parse(string text)
    {
        using var parser = new TextFieldParser(new StringReader(text)) { HasFieldsEnclosedInQuotes = true, TrimWhiteSpace = false };
        parser.SetDelimiters(",");
        var rows = new List<string[]>();
        while (!parser.EndOfData) rows.Add(parser.ReadFields()!);
        return rows;
    }
}
