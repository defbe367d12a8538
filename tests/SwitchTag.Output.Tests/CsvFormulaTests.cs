using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output;
using SwitchTag.Output.Text;
using SwitchTag.Output.MentionsCsv;
using SwitchTag.Output.WorklistCsv;
using Xunit;

namespace SwitchTag.Output.Tests;

/// <summary>CSV formula neutralisation (SCHEMA.md, "CSV files"), as the OWASP "CSV Injection" page
/// recommends (from memory): a cell starting with = + - @ TAB or CR gets a leading apostrophe and is
/// quoted. Files are parsed back with the .NET runtime's own CSV reader (TextFieldParser).</summary>
public class CsvFormulaTests
{
    private static readonly string[] Hostile =
        ["=HYPERLINK(\"http://x\",\"y\")", "+1+2", "-3", "@SUM(A1)", "\tx", "\r=1", "'=still text", "''@", "plain", "'tis", "a=b", ""];

    [Fact]
    public void Formula_cells_get_an_apostrophe_and_quotes_and_parse_back_to_the_original()
    {
        string csv = new Csv().Row(Hostile).ToString();
        var cells = Assert.Single(CsvText.Parse(csv));
        Assert.Equal(Hostile.Length, cells.Length);
        for (int i = 0; i < Hostile.Length; i++)
        {
            // What a spreadsheet sees never starts with a formula character...
            Assert.False(cells[i].Length > 0 && "=+-@\t\r".Contains(cells[i][0]), cells[i]);
            // ...and the text written is recovered exactly.
            Assert.Equal(Hostile[i], Csv.Restore(cells[i]));
        }
        Assert.StartsWith("\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\",\"'+1+2\",\"'-3\",\"'@SUM(A1)\",", csv);
        Assert.Contains(",\"''=still text\",\"'''@\",plain,'tis,a=b,\r\n", csv);
    }

    [Fact]
    public void Speaker_and_text_cells_of_mentions_csv_are_neutralised()
    {
        // Issue reproduction: a speaker label or text starting with = reached mentions.csv as a live formula.
        var index = Fixture.Run();
        var turn = index.TurnAt(index.Mentions[0].Mention.Turn);
        index = index with
        {
            Turns = [.. index.Turns.Select(t => t == turn ? t with { Speaker = "=cmd|' /C calc'!A0" } : t)],
            Mentions = [index.Mentions[0] with { Mention = index.Mentions[0].Mention with { Text = "@Kraków" } }, .. index.Mentions.Skip(1)],
        };
        var rows = CsvText.Parse(MentionsCsvWriter.Render(index));
        Assert.Equal("'=cmd|' /C calc'!A0", rows[1][4]);
        Assert.Equal("'@Kraków", rows[1][5]);
        Assert.Equal("=cmd|' /C calc'!A0", Csv.Restore(rows[1][4]));
        Assert.Equal("@Kraków", Csv.Restore(rows[1][5]));
    }

    [Fact]
    public void Worklist_text_starting_with_a_dash_is_neutralised()
    {
        var index = Fixture.Run();
        index = index with { Worklist = [index.Worklist[0] with { Text = "- a dash opens this stretch" }, .. index.Worklist.Skip(1)] };
        var rows = CsvText.Parse(WorklistCsvWriter.Render(index));
        Assert.Equal("'- a dash opens this stretch", rows[1][Array.IndexOf(WorklistCsvWriter.Header, "text")]);
        Assert.Equal("- a dash opens this stretch", Csv.Restore(rows[1][Array.IndexOf(WorklistCsvWriter.Header, "text")]));
    }
}
