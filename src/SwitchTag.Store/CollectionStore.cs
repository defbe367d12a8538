using System.Collections.Immutable;
using System.Globalization;
using Microsoft.Data.Sqlite;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Store;

/// <summary>The collection store: one SQLite file in the output folder holding every interview indexed
/// into it across runs. Not thread-safe: one thread writes, in a fixed order (see STORE.md).</summary>
public sealed class CollectionStore : IDisposable
{
    public const string DefaultFileName = "switchtag.sqlite";

    private static readonly string[] Extensions = [".sqlite", ".sqlite3", ".db"];

    private readonly SqliteConnection _connection;

    private CollectionStore(string path, SqliteConnection connection)
    {
        FilePath = path;
        _connection = connection;
    }

    public string FilePath { get; }

    public static int SchemaVersion => StoreSchema.Version;

    /// <summary>Opens the store in <paramref name="dir"/> (the one <c>*.sqlite</c>, <c>*.sqlite3</c> or <c>*.db</c>
    /// file there), creating folder and <see cref="DefaultFileName"/> when there is none, and migrates it.</summary>
    public static CollectionStore Open(string dir)
    {
        Directory.CreateDirectory(dir);
        return OpenFile(FindFile(dir) ?? Path.Combine(dir, DefaultFileName));
    }

    /// <summary>The store file directly in <paramref name="dir"/>, or null when there is none.</summary>
    public static string? FindFile(string dir)
    {
        if (!Directory.Exists(dir)) return null;
        var found = Directory.EnumerateFiles(dir)
            .Where(f => Extensions.Contains(Path.GetExtension(f), StringComparer.OrdinalIgnoreCase))
            .Order(StringComparer.Ordinal).ToList();
        string preferred = Path.Combine(dir, DefaultFileName);
        return found.Contains(preferred) ? preferred : found.FirstOrDefault();
    }

    public static CollectionStore OpenFile(string path)
    {
        // No pooling: the file is closed when the store is disposed, so the folder can be copied or moved.
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Pooling = false,
            ForeignKeys = true,
        }.ToString());
        connection.Open();
        try
        {
            // A rollback journal, not WAL: the store stays one file between runs; a run killed
            // mid-interview leaves a journal that the next open rolls back.
            Execute(connection, "PRAGMA journal_mode=DELETE");
            StoreSchema.Migrate(connection);
        }
        catch
        {
            connection.Dispose();
            throw;
        }
        return new CollectionStore(path, connection);
    }

    public void Dispose() => _connection.Dispose();

    /// <summary>Every interview in the store, by folder name.</summary>
    public IReadOnlyList<StoredInterview> Interviews()
    {
        using var command = _connection.CreateCommand();
        command.CommandText = "SELECT source_path, folder, name, sha256, model_versions FROM interviews ORDER BY folder";
        using var reader = command.ExecuteReader();
        var list = new List<StoredInterview>();
        while (reader.Read()) list.Add(new StoredInterview(reader.GetString(0), reader.GetString(1), reader.GetString(2), reader.GetString(3), reader.GetString(4)));
        return list;
    }

    public StoredInterview? Find(string sourcePath, IReadOnlyList<StoredInterview>? known = null)
    {
        string full = Path.GetFullPath(sourcePath);
        return (known ?? Interviews()).FirstOrDefault(i => i.SourcePath == full);
    }

    /// <summary>Whether an interview can be left as it is: the store holds it from the same bytes
    /// (<paramref name="sha256"/>) made by the same models and options (<paramref name="modelVersions"/>).</summary>
    public bool ShouldSkip(string sourcePath, string sha256, string modelVersions) =>
        Find(sourcePath) is { } stored && stored.Sha256 == sha256 && stored.ModelVersions == modelVersions;

    /// <summary>Adds or replaces one interview, all rows in one transaction: a run killed during it
    /// leaves the store as it was before. <paramref name="indexedAt"/> is kept for people only and is
    /// the one value that differs between two runs over the same input.</summary>
    public void Save(InterviewIndex index, string folder, string modelVersions, IReadOnlyList<StoredDecision> decisions, DateTimeOffset indexedAt)
    {
        string source = Path.GetFullPath(index.Transcript.Source.Path);
        using var tx = _connection.BeginTransaction();
        long? existing = ScalarOrNull(tx, "SELECT id FROM interviews WHERE source_path = $p", ("$p", source));
        if (existing is { } old) DeleteRows(tx, old);
        long id = existing ?? (ScalarOrNull(tx, "SELECT max(id) FROM interviews") ?? 0) + 1;
        Execute(tx, "INSERT INTO interviews VALUES ($id, $p, $f, $n, $fmt, $sha, $mv, $lang, $dur, $at)",
            ("$id", id), ("$p", source), ("$f", folder), ("$n", index.Transcript.Id), ("$fmt", index.Transcript.Source.Format.Name),
            ("$sha", index.Transcript.Source.Sha256), ("$mv", modelVersions), ("$lang", index.MainLanguage.Code),
            ("$dur", index.Duration.Milliseconds), ("$at", indexedAt.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture)));
        using (var rows = new InterviewRows(_connection, tx, id)) rows.Write(index, decisions);
        tx.Commit();
    }

    /// <summary>Removes one interview and all its rows (one transaction); false when it is not stored.</summary>
    public bool Remove(string sourcePath)
    {
        using var tx = _connection.BeginTransaction();
        long? id = ScalarOrNull(tx, "SELECT id FROM interviews WHERE source_path = $p", ("$p", Path.GetFullPath(sourcePath)));
        if (id is null) return false;
        DeleteRows(tx, id.Value);
        tx.Commit();
        return true;
    }

    /// <summary>The reviewer decisions stored with one interview: decision text → times applied.</summary>
    public IReadOnlyDictionary<string, int> Decisions(string sourcePath)
    {
        using var command = Command(null,
            "SELECT d.decision, d.applied FROM decisions d JOIN interviews i ON i.id = d.interview_id WHERE i.source_path = $p ORDER BY d.position",
            [("$p", Path.GetFullPath(sourcePath))]);
        using var reader = command.ExecuteReader();
        var applied = new Dictionary<string, int>(StringComparer.Ordinal);
        while (reader.Read()) applied[reader.GetString(0)] = reader.GetInt32(1);
        return applied;
    }

    /// <summary>Every interview with its headings (their mention times and variants), its mentions and
    /// its decisions, by folder name; headings and mentions in each interview's own order.</summary>
    public IReadOnlyList<CollectionInterview> Collection()
    {
        var times = new Dictionary<(long, string), ImmutableArray<Timecode>.Builder>();
        Each("SELECT interview_id, heading, start_ms FROM mentions WHERE heading IS NOT NULL ORDER BY interview_id, heading, heading_rank",
            r => Add(times, (r.GetInt64(0), r.GetString(1)), new Timecode(r.GetInt64(2))));
        var variants = new Dictionary<(long, string), ImmutableArray<string>.Builder>();
        Each("SELECT interview_id, heading, variant FROM heading_variants ORDER BY interview_id, heading, position",
            r => Add(variants, (r.GetInt64(0), r.GetString(1)), r.GetString(2)));
        var headings = new Dictionary<long, ImmutableArray<CollectionHeadingUse>.Builder>();
        Each("SELECT interview_id, heading, label, name, geoname_id, place_name, lat, lon, country, population FROM headings ORDER BY interview_id, position", r =>
        {
            long interview = r.GetInt64(0);
            string id = r.GetString(1);
            Add(headings, interview, new CollectionHeadingUse(new HeadingId(id), Enum.Parse<NameLabel>(r.GetString(2)), r.GetString(3), StoredPlace.Read(r, 4),
                times.TryGetValue((interview, id), out var t) ? t.ToImmutable() : [],
                variants.TryGetValue((interview, id), out var v) ? v.ToImmutable() : []));
        });
        var mentions = new Dictionary<long, ImmutableArray<StoredMention>.Builder>();
        // Each turn's speaker and text read once, by key, not joined onto every mention row: a join
        // copies the whole turn text per mention, quadratic in one long turn of many names.
        var turns = new Dictionary<(long, int), (string? Speaker, string Text)?>();
        using var turnQuery = _connection.CreateCommand();
        turnQuery.CommandText = "SELECT speaker, text FROM turns WHERE interview_id = $i AND turn = $t";
        var turnInterview = turnQuery.Parameters.Add("$i", SqliteType.Integer);
        var turnIndex = turnQuery.Parameters.Add("$t", SqliteType.Integer);
        (string? Speaker, string Text)? TurnOf(long interview, int turn)
        {
            turnInterview.Value = interview;
            turnIndex.Value = turn;
            using var r = turnQuery.ExecuteReader();
            return r.Read() ? (r.IsDBNull(0) ? null : r.GetString(0), r.GetString(1)) : null;
        }
        // The cells that repeat from row to row (a name, its heading, language, source, review reason)
        // are shared strings: read as they are, one long turn's 571k mentions held some 100 MB of copies.
        Each("SELECT interview_id, turn, char_start, char_end, start_ms, text, label, language, confidence, source, heading, review " +
             "FROM mentions ORDER BY interview_id, mention", r =>
        {
            long interview = r.GetInt64(0);
            int turn = r.GetInt32(1);
            if (!turns.TryGetValue((interview, turn), out var t)) turns[(interview, turn)] = t = TurnOf(interview, turn);
            if (t is not { } found) return; // a mention without its turn is left out
            var mention = new Mention(new TurnId(turn), new CharSpan(r.GetInt32(2), r.GetInt32(3)), Shared(r, 5), Enum.Parse<NameLabel>(r.GetString(6)),
                new LanguageCode(Shared(r, 7)), r.GetDouble(8), new MentionSource(Shared(r, 9)));
            Add(mentions, interview, new StoredMention(new Timecode(r.GetInt64(4)), mention, found.Speaker,
                r.IsDBNull(10) ? null : new HeadingId(Shared(r, 10)), r.IsDBNull(11) ? null : Shared(r, 11), found.Text));
        });
        var decisions = new Dictionary<long, ImmutableArray<string>.Builder>();
        Each("SELECT interview_id, decision FROM decisions ORDER BY interview_id, position", r => Add(decisions, r.GetInt64(0), r.GetString(1)));
        var interviews = new List<CollectionInterview>();
        Each("SELECT id, name, folder, main_language, duration_ms FROM interviews ORDER BY folder", r =>
        {
            long id = r.GetInt64(0);
            interviews.Add(new CollectionInterview(r.GetString(1), r.GetString(2), new LanguageCode(r.GetString(3)), new Timecode(r.GetInt64(4)),
                headings.TryGetValue(id, out var h) ? h.ToImmutable() : [],
                mentions.TryGetValue(id, out var m) ? m.ToImmutable() : [],
                decisions.TryGetValue(id, out var d) ? d.ToImmutable() : []));
        });
        return interviews;
    }

    private static string Shared(SqliteDataReader r, int column) => SharedStrings.Of(r.GetString(column));

    private static void Add<TKey, T>(Dictionary<TKey, ImmutableArray<T>.Builder> lists, TKey key, T item) where TKey : notnull
    {
        if (!lists.TryGetValue(key, out var list)) lists[key] = list = ImmutableArray.CreateBuilder<T>();
        list.Add(item);
    }

    private void Each(string sql, Action<SqliteDataReader> row)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        while (reader.Read()) row(reader);
    }

    public IReadOnlyList<SearchHit> Search(SearchQuery query) => new StoreSearch(_connection).Run(query);

    /// <summary>Row counts per table, for reports and tests.</summary>
    public IReadOnlyDictionary<string, long> Counts()
    {
        var counts = new SortedDictionary<string, long>(StringComparer.Ordinal);
        foreach (var table in DataTables.Append("interviews"))
            counts[table] = ScalarOrNull(null, $"SELECT count(*) FROM {table}") ?? 0;
        return counts;
    }

    internal static readonly string[] DataTables = ["search_rows", "decisions", "worklist", "mentions", "heading_variants", "headings", "language_spans", "cues", "turns"];

    private void DeleteRows(SqliteTransaction tx, long id)
    {
        foreach (var table in DataTables) Execute(tx, $"DELETE FROM {table} WHERE interview_id = $id", ("$id", id));
        Execute(tx, "DELETE FROM interviews WHERE id = $id", ("$id", id));
    }

    private void Execute(SqliteTransaction? tx, string sql, params (string Name, object? Value)[] parameters)
    {
        using var command = Command(tx, sql, parameters);
        command.ExecuteNonQuery();
    }

    private long? ScalarOrNull(SqliteTransaction? tx, string sql, params (string Name, object? Value)[] parameters)
    {
        using var command = Command(tx, sql, parameters);
        return command.ExecuteScalar() is long value ? value : null;
    }

    private SqliteCommand Command(SqliteTransaction? tx, string sql, (string Name, object? Value)[] parameters)
    {
        var command = _connection.CreateCommand();
        command.Transaction = tx;
        command.CommandText = sql;
        foreach (var (name, value) in parameters) command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        return command;
    }

    private static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
