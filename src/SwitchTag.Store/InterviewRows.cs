using Microsoft.Data.Sqlite;
using SwitchTag.Core.Documents;

namespace SwitchTag.Store;

/// <summary>Writes every row of one interview inside the caller's transaction. Rows go in index order,
/// so two stores fed the same interviews in the same order hold the same rows with the same ids.</summary>
internal sealed class InterviewRows(SqliteConnection connection, SqliteTransaction transaction, long interviewId) : IDisposable
{
    private readonly List<SqliteCommand> _commands = [];

    public void Dispose()
    {
        foreach (var command in _commands) command.Dispose();
    }

    public void Write(InterviewIndex index, IReadOnlyList<StoredDecision> decisions)
    {
        WriteTurns(index);
        WriteSpans(index);
        WriteHeadings(index);
        WriteMentions(index);
        WriteWorklist(index);
        var decision = Command("INSERT INTO decisions VALUES ($i, $p, $d, $a)", "$p", "$d", "$a");
        for (int i = 0; i < decisions.Count; i++) Run(decision, i, decisions[i].Decision, decisions[i].Applied);
        WriteSearchRows(index);
    }

    private void WriteTurns(InterviewIndex index)
    {
        var turn = Command("INSERT INTO turns VALUES ($i, $t, $s, $l, $a, $b, $x)", "$t", "$s", "$l", "$a", "$b", "$x");
        var cue = Command("INSERT INTO cues VALUES ($i, $t, $c, $cs, $ce, $a, $b, $n)", "$t", "$c", "$cs", "$ce", "$a", "$b", "$n");
        foreach (var t in index.Turns)
        {
            Run(turn, t.Id.Index, t.Speaker, t.SpeakerLabel, t.Time.Start.Milliseconds, t.Time.End.Milliseconds, t.Text);
            foreach (var c in t.Cues)
            {
                var source = index.Transcript.Cues[c.CueIndex];
                Run(cue, t.Id.Index, c.CueIndex, c.CharStart, c.CharEnd, source.Time.Start.Milliseconds, source.Time.End.Milliseconds, source.At.Line);
            }
        }
    }

    private void WriteSpans(InterviewIndex index)
    {
        var span = Command("INSERT INTO language_spans VALUES ($i, $t, $n, $cs, $ce, $a, $b, $l, $c)", "$t", "$n", "$cs", "$ce", "$a", "$b", "$l", "$c");
        for (int t = 0; t < index.Spans.Length; t++)
            for (int n = 0; n < index.Spans[t].Length; n++)
            {
                var (s, time) = index.Spans[t][n];
                Run(span, t, n, s.CharStart, s.CharEnd, time.Start.Milliseconds, time.End.Milliseconds, s.Language.Code, s.Confidence);
            }
    }

    private void WriteHeadings(InterviewIndex index)
    {
        var heading = Command("INSERT INTO headings VALUES ($i, $h, $p, $l, $n, $g, $pn, $la, $lo, $c, $po, $cf, $s)",
            "$h", "$p", "$l", "$n", "$g", "$pn", "$la", "$lo", "$c", "$po", "$cf", "$s");
        var variant = Command("INSERT INTO heading_variants VALUES ($i, $h, $p, $v)", "$h", "$p", "$v");
        for (int p = 0; p < index.Headings.Length; p++)
        {
            var h = index.Headings[p];
            var place = h.Place;
            Run(heading, h.Id.Value, p, h.Label.ToString(), h.Name, place?.GeonameId, place?.Name, place?.Latitude, place?.Longitude,
                place?.Country, place?.Population, h.Confidence, h.Source.Name);
            for (int v = 0; v < h.Variants.Length; v++) Run(variant, h.Id.Value, v, h.Variants[v]);
        }
    }

    private void WriteMentions(InterviewIndex index)
    {
        // A reason and a rank per mention, by index (-1: none): as hash tables keyed by id, a long
        // turn's 571k mentions put their entries and every resize through the large object heap.
        var reasons = new string?[index.Mentions.Length];
        foreach (var item in index.Review) reasons[item.Mention.Index] = item.Reason;
        var rank = new int[index.Mentions.Length];
        Array.Fill(rank, -1);
        foreach (var h in index.Headings)
            for (int r = 0; r < h.Mentions.Length; r++) rank[h.Mentions[r].Index] = r;
        var mention = Command("INSERT INTO mentions VALUES ($i, $m, $t, $cs, $ce, $a, $b, $x, $l, $la, $c, $s, $h, $r, $rv)",
            "$m", "$t", "$cs", "$ce", "$a", "$b", "$x", "$l", "$la", "$c", "$s", "$h", "$r", "$rv");
        for (int i = 0; i < index.Mentions.Length; i++)
        {
            var (m, time, headingId) = index.Mentions[i];
            Run(mention, i, m.Turn.Index, m.CharStart, m.CharEnd, time.Start.Milliseconds, time.End.Milliseconds, m.Text, m.Label.ToString(),
                m.Language.Code, m.Confidence, m.Source.Name, headingId?.Value, rank[i] >= 0 ? rank[i] : null, reasons[i]);
        }
    }

    private void WriteWorklist(InterviewIndex index)
    {
        var item = Command("INSERT INTO worklist VALUES ($i, $n, $t, $cs, $ce, $a, $b, $s, $l, $c, $x)", "$n", "$t", "$cs", "$ce", "$a", "$b", "$s", "$l", "$c", "$x");
        for (int n = 0; n < index.Worklist.Length; n++)
        {
            var w = index.Worklist[n];
            Run(item, n, w.Turn.Index, w.CharStart, w.CharEnd, w.Time.Start.Milliseconds, w.Time.End.Milliseconds, w.Speaker, w.Language.Code, w.Confidence, w.Text);
        }
    }

    /// <summary>Headings (name and each variant) and turn text cut at cue and language-span bounds, so a
    /// text hit has one time (its cue's) and one language.</summary>
    private void WriteSearchRows(InterviewIndex index)
    {
        var row = Command("INSERT INTO search_rows(interview_id, kind, heading, turn, char_start, char_end, language, start_ms, end_ms, text, terms) " +
                          "VALUES ($i, $k, $h, $t, $cs, $ce, $l, $a, $b, $x, $terms)", "$k", "$h", "$t", "$cs", "$ce", "$l", "$a", "$b", "$x", "$terms");
        foreach (var h in index.Headings)
            foreach (var name in h.Variants.Prepend(h.Name).Distinct(StringComparer.Ordinal))
                Run(row, "heading", h.Id.Value, null, null, null, null, null, null, name, SearchTerms.Of(name));
        foreach (var turn in index.Turns)
        {
            // Cues and language spans are both in text order, spans disjoint: the spans a cue meets
            // start where the previous cue's left off, so one long turn is not cues x spans.
            var spans = index.Spans[turn.Id.Index];
            int first = 0;
            foreach (var c in turn.Cues)
            {
                var cueTime = index.Transcript.Cues[c.CueIndex].Time;
                while (first < spans.Length && spans[first].Value.CharEnd <= c.CharStart) first++;
                for (int k = first; k < spans.Length && spans[k].Value.CharStart < c.CharEnd; k++)
                {
                    var span = spans[k].Value;
                    int from = Math.Max(c.CharStart, span.CharStart), to = Math.Min(c.CharEnd, span.CharEnd);
                    if (from >= to) continue;
                    string piece = turn.Text[from..to];
                    string terms = SearchTerms.Of(piece);
                    if (terms.Length == 0) continue;
                    Run(row, "text", null, turn.Id.Index, from, to, span.Language.Code, cueTime.Start.Milliseconds, cueTime.End.Milliseconds, piece, terms);
                }
            }
        }
    }

    private SqliteCommand Command(string sql, params string[] names)
    {
        var command = connection.CreateCommand();
        _commands.Add(command);
        command.Transaction = transaction;
        command.CommandText = sql;
        command.Parameters.AddWithValue("$i", interviewId);
        foreach (var name in names) command.Parameters.Add(new SqliteParameter(name, null));
        command.Prepare();
        return command;
    }

    private static void Run(SqliteCommand command, params object?[] values)
    {
        for (int k = 0; k < values.Length; k++)
            command.Parameters[k + 1].Value = values[k] ?? DBNull.Value;
        command.ExecuteNonQuery();
    }
}
