using SwitchTag.Core.Text;

namespace SwitchTag.Lexicon.Tests;

/// <summary>The examples of RFC 4180 §2 ("Definition of the CSV Format"), rules 1–7.</summary>
public class Rfc4180ReaderTests
{
    [Fact]
    public void Rule1_records_are_separated_by_CRLF()
    {
        // RFC 4180 §2 rule 1: aaa,bbb,ccc CRLF zzz,yyy,xxx CRLF
        var (records, problems) = Rfc4180Reader.Parse("aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n");
        Assert.Empty(problems);
        Assert.Equal(["aaa", "bbb", "ccc"], records[0].Fields.ToArray());
        Assert.Equal(["zzz", "yyy", "xxx"], records[1].Fields.ToArray());
        Assert.Equal(2, records.Length);
    }

    [Fact]
    public void Rule2_last_record_may_lack_a_line_break()
    {
        // RFC 4180 §2 rule 2: aaa,bbb,ccc CRLF zzz,yyy,xxx
        var (records, _) = Rfc4180Reader.Parse("aaa,bbb,ccc\r\nzzz,yyy,xxx");
        Assert.Equal(["zzz", "yyy", "xxx"], records[1].Fields.ToArray());
    }

    [Fact]
    public void Rule5_fields_may_be_enclosed_in_double_quotes()
    {
        // RFC 4180 §2 rule 5: "aaa","bbb","ccc" CRLF zzz,yyy,xxx
        var (records, _) = Rfc4180Reader.Parse("\"aaa\",\"bbb\",\"ccc\"\r\nzzz,yyy,xxx");
        Assert.Equal(["aaa", "bbb", "ccc"], records[0].Fields.ToArray());
    }

    [Fact]
    public void Rule6_quoted_fields_hold_line_breaks_and_commas()
    {
        // RFC 4180 §2 rule 6: "aaa","b CRLF bb","ccc" CRLF zzz,yyy,xxx
        var (records, problems) = Rfc4180Reader.Parse("\"aaa\",\"b\r\nbb\",\"ccc\"\r\nzzz,yyy,xxx");
        Assert.Empty(problems);
        Assert.Equal(["aaa", "b\r\nbb", "ccc"], records[0].Fields.ToArray());
        Assert.Equal(1, records[0].Line);
        Assert.Equal(3, records[1].Line); // the second record starts on the file's third line
        var (commas, _) = Rfc4180Reader.Parse("\"a,b\",c");
        Assert.Equal(["a,b", "c"], commas[0].Fields.ToArray());
    }

    [Fact]
    public void Rule7_a_double_quote_inside_a_quoted_field_is_doubled()
    {
        // RFC 4180 §2 rule 7: "aaa","b""bb","ccc"
        var (records, _) = Rfc4180Reader.Parse("\"aaa\",\"b\"\"bb\",\"ccc\"");
        Assert.Equal(["aaa", "b\"bb", "ccc"], records[0].Fields.ToArray());
    }

    [Fact]
    public void Rule4_spaces_are_part_of_a_field()
    {
        // RFC 4180 §2 rule 4: "Spaces are considered part of a field and should not be ignored."
        var (records, _) = Rfc4180Reader.Parse("a , b");
        Assert.Equal(["a ", " b"], records[0].Fields.ToArray());
    }

    [Fact]
    public void Malformed_quoting_is_reported_with_its_line()
    {
        // RFC 4180 §2 rule 5: "If fields are not enclosed with double quotes, then double quotes
        // may not appear inside the fields."
        var (records, problems) = Rfc4180Reader.Parse("ok,row\nbad\"quote,x\nok,again\n\"never closed");
        Assert.Equal(2, records.Length);
        Assert.Equal([2, 4], problems.Select(p => p.Line));
    }
}
