using Microsoft.Data.Sqlite;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

namespace SwitchTag.Store;

/// <summary>One search over the store: full-text candidates from FTS5, checked with the index's name
/// matching, turned into hits (see <see cref="SearchHit"/>), filtered and put in a fixed order.</summary>
internal sealed class StoreSearch(SqliteConnection connection)
{
    private sealed record TurnInfo(string Folder, string? Speaker, string Text);

    private readonly Dictionary<(long, TurnId), TurnInfo> _turns = [];
    private readonly Dictionary<(string, LanguageCode, int), bool> _meets = [];

    public IReadOnlyList<SearchHit> Run(SearchQuery query)
    {
        var words = SearchTerms.QueryWords(query.Text);
        if (words.Count == 0 && query.Near is null) return [];

        var headings = new Dictionary<(long Interview, HeadingId Heading), double?>();
        var textHits = new List<SearchHit>();
        // Only a word the full-text match could have met is worth the full name comparison.
        var firstPrefixes = words.Count > 0 ? SearchTerms.PrefixesOf(words[0]) : [];
        if (words.Count > 0)
            foreach (var row in Candidates(words))
            {
                // The stored folded words decide; the text is split for offsets only when something matched.
                var terms = row.Terms.Split(' ');
                List<(int Start, int End)>? rowWords = null;
                for (int i = 0; i < terms.Length; i++)
                {
                    if (!firstPrefixes.Any(p => terms[i].StartsWith(p, StringComparison.Ordinal))) continue;
                    if (!SearchTerms.MeetsAt(terms, i, words, row.Language, _meets)) continue;
                    if (row.Heading is { } heading) { headings[(row.Interview, heading)] = null; break; }
                    rowWords ??= NameWords.Bounds(row.Text);
                    int start = row.CharStart + rowWords[i].Start, end = row.CharStart + rowWords[i + words.Count - 1].End;
                    var turnId = row.Turn!.Value; // a text row always has its turn
                    var turn = _turns[(row.Interview, turnId)];
                    textHits.Add(new SearchHit(turn.Folder, new TimeRange(new Timecode(row.StartMs), new Timecode(row.EndMs)), turn.Speaker, null,
                        Sentence.Around(turn.Text, start, end), turn.Text[start..end], row.Language, turnId, start, end, null, null, null, null));
                }
            }

        if (query.Near is { } near)
        {
            var nearby = Nearby(near);
            headings = words.Count == 0
                ? nearby
                : headings.Keys.Where(nearby.ContainsKey).ToDictionary(k => k, k => nearby[k]);
            textHits.Clear();
        }

        var hits = MentionHits(headings);
        var named = hits.ToLookup(h => (h.Interview, h.Turn));
        // A text hit inside a mention already listed says nothing more.
        hits.AddRange(textHits.Where(t => !named[(t.Interview, t.Turn)].Any(n => n.CharStart < t.CharEnd && t.CharStart < n.CharEnd)));

        string? speaker = query.Speaker is null ? null : NameFolding.FoldedWords(query.Speaker);
        return hits
            .Where(h => query.Label is null || h.Label == query.Label)
            .Where(h => query.Language is null || string.Equals(h.Language.Code, query.Language, StringComparison.OrdinalIgnoreCase))
            .Where(h => speaker is null || (h.Speaker is not null && NameFolding.FoldedWords(h.Speaker) == speaker))
            .OrderBy(h => h.Interview, StringComparer.Ordinal)
            .ThenBy(h => h.Time.Start).ThenBy(h => h.Turn).ThenBy(h => h.CharStart).ThenBy(h => h.Label is null)
            .ToList();
    }

    private sealed record Row(long Interview, HeadingId? Heading, TurnId? Turn, int CharStart, LanguageCode Language, long StartMs, long EndMs, string Text, string Terms);

    /// <summary>The rows the full-text index matches; for text rows the turn's folder, speaker and text
    /// come along (one query, not one per hit).</summary>
    private List<Row> Candidates(IReadOnlyList<string> words)
    {
        using var command = connection.CreateCommand();
        command.CommandText =
            "SELECT r.interview_id, r.heading, r.turn, r.char_start, r.language, r.start_ms, r.end_ms, r.text, i.folder, t.speaker, t.text, r.terms " +
            "FROM search_fts JOIN search_rows r ON r.id = search_fts.rowid JOIN interviews i ON i.id = r.interview_id " +
            "LEFT JOIN turns t ON t.interview_id = r.interview_id AND t.turn = r.turn WHERE search_fts MATCH $q ORDER BY r.id";
        command.Parameters.AddWithValue("$q", SearchTerms.MatchExpression(words));
        using var reader = command.ExecuteReader();
        var rows = new List<Row>();
        while (reader.Read())
        {
            var row = new Row(reader.GetInt64(0), reader.IsDBNull(1) ? null : new HeadingId(reader.GetString(1)), reader.IsDBNull(2) ? null : new TurnId(reader.GetInt32(2)),
                reader.IsDBNull(3) ? 0 : reader.GetInt32(3), reader.IsDBNull(4) ? LanguageCode.Undetermined : new LanguageCode(reader.GetString(4)),
                reader.IsDBNull(5) ? 0 : reader.GetInt64(5), reader.IsDBNull(6) ? 0 : reader.GetInt64(6), reader.GetString(7), reader.GetString(11));
            if (row.Heading is null)
                _turns.TryAdd((row.Interview, row.Turn!.Value), new TurnInfo(reader.GetString(8), reader.IsDBNull(9) ? null : reader.GetString(9), reader.GetString(10)));
            rows.Add(row);
        }
        return rows;
    }

    /// <summary>Headings linked to a place within the radius of any place the collection links the
    /// name <see cref="NearPlace.Place"/> to, with the distance to the nearest such centre.</summary>
    private Dictionary<(long, HeadingId), double?> Nearby(NearPlace near)
    {
        var placeWords = SearchTerms.QueryWords(near.Place);
        var linked = new List<(long Interview, HeadingId Heading, double Lat, double Lon)>();
        using (var command = connection.CreateCommand())
        {
            command.CommandText = "SELECT interview_id, heading, lat, lon FROM headings WHERE lat IS NOT NULL ORDER BY interview_id, position";
            using var reader = command.ExecuteReader();
            while (reader.Read()) linked.Add((reader.GetInt64(0), new HeadingId(reader.GetString(1)), reader.GetDouble(2), reader.GetDouble(3)));
        }
        var named = placeWords.Count == 0 ? [] : Candidates(placeWords)
            .Where(r => r.Heading is not null)
            .Where(r => { var w = r.Terms.Split(' '); return w.Length == placeWords.Count && SearchTerms.MeetsAt(w, 0, placeWords, LanguageCode.Undetermined, new()); })
            .Select(r => (r.Interview, r.Heading!.Value)).ToHashSet();
        var centres = linked.Where(l => named.Contains((l.Interview, l.Heading))).Select(l => (l.Lat, l.Lon)).Distinct().ToList();
        var result = new Dictionary<(long, HeadingId), double?>();
        foreach (var (interview, heading, lat, lon) in linked)
        {
            if (centres.Count == 0) break;
            double distance = centres.Min(c => GeoDistance.Kilometres(c.Lat, c.Lon, lat, lon));
            if (distance <= near.Kilometres) result[(interview, heading)] = distance;
        }
        return result;
    }

    /// <summary>Every mention filed under the headings, in one query (the keys go in as a JSON array).</summary>
    private List<SearchHit> MentionHits(Dictionary<(long Interview, HeadingId Heading), double?> headings)
    {
        var hits = new List<SearchHit>();
        if (headings.Count == 0) return hits;
        using var command = connection.CreateCommand();
        command.CommandText =
            "SELECT m.turn, m.char_start, m.char_end, m.start_ms, m.end_ms, m.text, m.label, m.language, h.name, " +
            "h.geoname_id, h.place_name, h.lat, h.lon, h.country, h.population, i.folder, t.speaker, t.text, m.interview_id, m.heading " +
            "FROM json_each($keys) k JOIN mentions m ON m.interview_id = k.value ->> 0 AND m.heading = k.value ->> 1 " +
            "JOIN headings h ON h.interview_id = m.interview_id AND h.heading = m.heading " +
            "JOIN interviews i ON i.id = m.interview_id JOIN turns t ON t.interview_id = m.interview_id AND t.turn = m.turn " +
            "ORDER BY m.interview_id, m.heading, m.heading_rank";
        command.Parameters.AddWithValue("$keys", System.Text.Json.JsonSerializer.Serialize(headings.Keys.Select(k => new object[] { k.Interview, k.Heading.Value })));
        using var reader = command.ExecuteReader();
        while (reader.Read())
        {
            int start = reader.GetInt32(1), end = reader.GetInt32(2);
            string folder = reader.GetString(15), text = reader.GetString(17);
            var heading = new HeadingId(reader.GetString(19));
            hits.Add(new SearchHit(folder, new TimeRange(new Timecode(reader.GetInt64(3)), new Timecode(reader.GetInt64(4))),
                reader.IsDBNull(16) ? null : reader.GetString(16), Enum.Parse<NameLabel>(reader.GetString(6)), Sentence.Around(text, start, end),
                reader.GetString(5), new LanguageCode(reader.GetString(7)), new TurnId(reader.GetInt32(0)), start, end, heading, reader.GetString(8), StoredPlace.Read(reader, 9),
                headings[(reader.GetInt64(18), heading)]));
        }
        return hits;
    }
}
