using System.Globalization;
using Microsoft.Data.Sqlite;

namespace SwitchTag.Store;

/// <summary>What <see cref="SearchRun.Execute"/> did: searched (with or without hits), or found no
/// store it could read in the folder (nothing is created there).</summary>
public enum SearchRunResult { Searched, NoReadableStore }

/// <summary><c>switchtag search</c> once its options have made a <see cref="SearchQuery"/>: the
/// folder's collection store searched and every hit printed, one per line (DESIGN.md contract: with
/// <paramref name="json"/> one JSON object per hit and per line).</summary>
public static class SearchRun
{
    public static SearchRunResult Execute(string folder, SearchQuery query, bool json, TextWriter output, TextWriter log)
    {
        if (CollectionStore.FindFile(folder) is null)
        {
            log.WriteLine($"switchtag search: no collection store in {folder} (run 'switchtag index ... --out {folder}' first)");
            return SearchRunResult.NoReadableStore;
        }
        IReadOnlyList<SearchHit> hits;
        try
        {
            using var store = CollectionStore.Open(folder);
            hits = store.Search(query);
        }
        catch (Exception e) when (e is SqliteException or InvalidDataException)
        {
            log.WriteLine($"switchtag search: the collection store in {folder} cannot be read: {e.Message}");
            return SearchRunResult.NoReadableStore;
        }
        foreach (var hit in hits) output.WriteLine(json ? hit.ToJson() : hit.ToString());
        if (!json) log.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{hits.Count} hits"));
        return SearchRunResult.Searched;
    }
}
