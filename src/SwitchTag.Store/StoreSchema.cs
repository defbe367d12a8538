using Microsoft.Data.Sqlite;

namespace SwitchTag.Store;

/// <summary>The store's tables, created by migration steps. <c>schema_version</c> holds the number of
/// the last step applied; opening a store applies the steps after it, each in its own transaction, so
/// a store written by an older SwitchTag is brought up to date in place and never rebuilt.</summary>
internal static class StoreSchema
{
    /// <summary>Step n (1-based) takes the store from version n-1 to version n. Append new steps;
    /// never edit a published one.</summary>
    private static readonly string[] Steps =
    [
        """
        CREATE TABLE interviews(
            id INTEGER PRIMARY KEY,
            source_path TEXT NOT NULL UNIQUE,
            folder TEXT NOT NULL UNIQUE,
            name TEXT NOT NULL,
            format TEXT NOT NULL,
            sha256 TEXT NOT NULL,
            model_versions TEXT NOT NULL,
            main_language TEXT NOT NULL,
            duration_ms INTEGER NOT NULL,
            indexed_at TEXT NOT NULL);
        CREATE TABLE turns(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            turn INTEGER NOT NULL,
            speaker TEXT,
            speaker_label TEXT,
            start_ms INTEGER NOT NULL,
            end_ms INTEGER NOT NULL,
            text TEXT NOT NULL,
            PRIMARY KEY(interview_id, turn)) WITHOUT ROWID;
        CREATE TABLE cues(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            turn INTEGER NOT NULL,
            cue INTEGER NOT NULL,
            char_start INTEGER NOT NULL,
            char_end INTEGER NOT NULL,
            start_ms INTEGER NOT NULL,
            end_ms INTEGER NOT NULL,
            line INTEGER NOT NULL,
            PRIMARY KEY(interview_id, cue)) WITHOUT ROWID;
        CREATE TABLE language_spans(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            turn INTEGER NOT NULL,
            span INTEGER NOT NULL,
            char_start INTEGER NOT NULL,
            char_end INTEGER NOT NULL,
            start_ms INTEGER NOT NULL,
            end_ms INTEGER NOT NULL,
            language TEXT NOT NULL,
            confidence REAL NOT NULL,
            PRIMARY KEY(interview_id, turn, span)) WITHOUT ROWID;
        CREATE TABLE headings(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            heading TEXT NOT NULL,
            position INTEGER NOT NULL,
            label TEXT NOT NULL,
            name TEXT NOT NULL,
            geoname_id INTEGER,
            place_name TEXT,
            lat REAL,
            lon REAL,
            country TEXT,
            population INTEGER,
            confidence REAL NOT NULL,
            source TEXT NOT NULL,
            PRIMARY KEY(interview_id, heading)) WITHOUT ROWID;
        CREATE TABLE heading_variants(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            heading TEXT NOT NULL,
            position INTEGER NOT NULL,
            variant TEXT NOT NULL,
            PRIMARY KEY(interview_id, heading, position)) WITHOUT ROWID;
        CREATE TABLE mentions(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            mention INTEGER NOT NULL,
            turn INTEGER NOT NULL,
            char_start INTEGER NOT NULL,
            char_end INTEGER NOT NULL,
            start_ms INTEGER NOT NULL,
            end_ms INTEGER NOT NULL,
            text TEXT NOT NULL,
            label TEXT NOT NULL,
            language TEXT NOT NULL,
            confidence REAL NOT NULL,
            source TEXT NOT NULL,
            heading TEXT,
            heading_rank INTEGER,
            review TEXT,
            PRIMARY KEY(interview_id, mention)) WITHOUT ROWID;
        CREATE INDEX mentions_by_heading ON mentions(interview_id, heading, heading_rank);
        CREATE TABLE worklist(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            item INTEGER NOT NULL,
            turn INTEGER NOT NULL,
            char_start INTEGER NOT NULL,
            char_end INTEGER NOT NULL,
            start_ms INTEGER NOT NULL,
            end_ms INTEGER NOT NULL,
            speaker TEXT,
            language TEXT NOT NULL,
            confidence REAL NOT NULL,
            text TEXT NOT NULL,
            PRIMARY KEY(interview_id, item)) WITHOUT ROWID;
        CREATE TABLE decisions(
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            position INTEGER NOT NULL,
            decision TEXT NOT NULL,
            applied INTEGER NOT NULL,
            PRIMARY KEY(interview_id, position)) WITHOUT ROWID;
        CREATE TABLE search_rows(
            id INTEGER PRIMARY KEY,
            interview_id INTEGER NOT NULL REFERENCES interviews(id),
            kind TEXT NOT NULL,
            heading TEXT,
            turn INTEGER,
            char_start INTEGER,
            char_end INTEGER,
            language TEXT,
            start_ms INTEGER,
            end_ms INTEGER,
            text TEXT NOT NULL,
            terms TEXT NOT NULL);
        CREATE INDEX search_rows_by_interview ON search_rows(interview_id);
        CREATE VIRTUAL TABLE search_fts USING fts5(
            terms, content='search_rows', content_rowid='id',
            tokenize='unicode61 remove_diacritics 0', prefix='3');
        CREATE TRIGGER search_rows_ai AFTER INSERT ON search_rows BEGIN
            INSERT INTO search_fts(rowid, terms) VALUES (new.id, new.terms);
        END;
        CREATE TRIGGER search_rows_ad AFTER DELETE ON search_rows BEGIN
            INSERT INTO search_fts(search_fts, rowid, terms) VALUES ('delete', old.id, old.terms);
        END;
        """,
    ];

    public static int Version => Steps.Length;

    /// <summary>Brings the store to <see cref="Version"/>; refuses a store from a newer SwitchTag.</summary>
    public static void Migrate(SqliteConnection connection)
    {
        Execute(connection, null, "CREATE TABLE IF NOT EXISTS schema_version(version INTEGER NOT NULL)");
        long current = Scalar(connection, "SELECT coalesce(max(version), 0) FROM schema_version");
        if (current > Steps.Length)
            throw new InvalidDataException($"the store has schema version {current}; this SwitchTag knows versions up to {Steps.Length}");
        for (long step = current; step < Steps.Length; step++)
        {
            using var tx = connection.BeginTransaction();
            Execute(connection, tx, Steps[step]);
            Execute(connection, tx, "DELETE FROM schema_version");
            Execute(connection, tx, $"INSERT INTO schema_version(version) VALUES ({step + 1})");
            tx.Commit();
        }
    }

    private static void Execute(SqliteConnection connection, SqliteTransaction? tx, string sql)
    {
        using var command = connection.CreateCommand();
        command.Transaction = tx;
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private static long Scalar(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
    }
}
