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

    [Fact]
    public void A_quote_never_closed_costs_only_its_own_line()
    {
        // RFC 4180 §2 rule 6 lets a quoted field hold line breaks, so a quote that is never closed
        // would run to the end of the file; the reader gives up that one line and reads on.
        var (records, problems) = Rfc4180Reader.Parse("a,b\n\"open,c\nnext,row\nlast,x\n");
        Assert.Equal(["a,b", "next,row", "last,x"], records.Select(r => string.Join(",", r.Fields)));
        Assert.Equal([3, 4], records.Skip(1).Select(r => r.Line));
        Assert.Equal([2], problems.Select(p => p.Line));

        // The same stray quote "closed" by a quote of a later row (a value that is quoted as rule 5
        // allows) still costs only its own line.
        (records, problems) = Rfc4180Reader.Parse("a,b\n\"open,c\nnext,row\nlast,\"x\"\n");
        Assert.Equal(["a,b", "next,row", "last,x"], records.Select(r => string.Join(",", r.Fields)));
        Assert.Equal([2], problems.Select(p => p.Line));
    }
}
