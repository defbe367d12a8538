using Microsoft.Data.Sqlite;
using SwitchTag.Core.Documents;

namespace SwitchTag.Store;

/// <summary>Reads a heading's place from the columns geoname_id, place_name, lat, lon, country,
/// population (in that order from <c>first</c>); null when the heading has none.</summary>
internal static class StoredPlace
{
    public static PlaceLink? Read(SqliteDataReader reader, int first) =>
        reader.IsDBNull(first + 2) ? null : new PlaceLink(
            reader.GetInt64(first), reader.GetString(first + 1), reader.GetDouble(first + 2), reader.GetDouble(first + 3),
            reader.GetString(first + 4), reader.GetInt64(first + 5));
}
