using System.IO.Compression;
using System.Text;

namespace SwitchTag.Lexicon;

/// <summary>The compact gazetteer file: a gzip stream holding the places, the sorted folded names
/// (front-coded: each key stores only what differs from the one before) with the places each names,
/// and the words with a <see cref="NameCaution"/>. Integers are 7-bit encoded.</summary>
internal static class GazetteerFile
{
    private const string Magic = "SWITCHTAG-GAZETTEER";
    private const int Version = 1;

    public static void Write(string path, IReadOnlyList<GazetteerPlace> places, NameIndex index, IReadOnlyDictionary<string, NameCaution> cautions)
    {
        Directory.CreateDirectory(Path.GetDirectoryName(Path.GetFullPath(path))!);
        using var file = File.Create(path);
        using var gzip = new GZipStream(file, CompressionLevel.SmallestSize);
        using var w = new BinaryWriter(gzip, Encoding.UTF8);
        w.Write(Magic);
        w.Write7BitEncodedInt(Version);

        var codes = places.Select(p => p.FeatureCode).Distinct().Order(StringComparer.Ordinal).ToList();
        var codeIndex = codes.Select((c, i) => (c, i)).ToDictionary(p => p.c, p => p.i);
        w.Write7BitEncodedInt(codes.Count);
        foreach (var code in codes) w.Write(code);

        w.Write7BitEncodedInt(places.Count);
        foreach (var p in places)
        {
            w.Write7BitEncodedInt64(p.GeonameId);
            w.Write(p.Name);
            w.Write(p.Latitude);
            w.Write(p.Longitude);
            w.Write(p.Country);
            w.Write7BitEncodedInt64(p.Population);
            w.Write7BitEncodedInt(codeIndex[p.FeatureCode]);
        }

        w.Write7BitEncodedInt(index.Count);
        string previous = "";
        for (int k = 0; k < index.Count; k++)
        {
            var key = index.KeyAt(k);
            int shared = SharedPrefix(previous, key);
            w.Write7BitEncodedInt(shared);
            w.Write(key[shared..]);
            var ids = index.IdsAt(k);
            w.Write7BitEncodedInt(ids.Length);
            int last = 0;
            foreach (int id in ids) { w.Write7BitEncodedInt(id - last); last = id; }
            previous = key;
        }

        w.Write7BitEncodedInt(cautions.Count);
        foreach (var (word, caution) in cautions.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            w.Write(word);
            w.Write((byte)caution);
        }
    }

    /// <exception cref="InvalidDataException">The file is not a gazetteer file of this version or is cut short.</exception>
    public static (GazetteerPlace[] Places, NameIndex Index, Dictionary<string, NameCaution> Cautions) Read(string path)
    {
        using var file = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16);
        using var gzip = new GZipStream(file, CompressionMode.Decompress);
        using var buffered = new BufferedStream(gzip, 1 << 16);
        using var r = new BinaryReader(buffered, Encoding.UTF8);
        try
        {
            if (r.ReadString() != Magic) throw new InvalidDataException("not a gazetteer file");
            int version = r.Read7BitEncodedInt();
            if (version != Version) throw new InvalidDataException($"gazetteer file version {version}, expected {Version}");

            var codes = new string[r.Read7BitEncodedInt()];
            for (int i = 0; i < codes.Length; i++) codes[i] = r.ReadString();

            var places = new GazetteerPlace[r.Read7BitEncodedInt()];
            var countries = new Dictionary<string, string>(StringComparer.Ordinal);
            for (int i = 0; i < places.Length; i++)
            {
                long id = r.Read7BitEncodedInt64();
                string name = r.ReadString();
                double lat = r.ReadDouble(), lon = r.ReadDouble();
                string read = r.ReadString();
                // one string per country code, not one per place
                string country = countries.TryGetValue(read, out var known) ? known : countries[read] = read;
                long population = r.Read7BitEncodedInt64();
                places[i] = new GazetteerPlace(id, name, lat, lon, country, population, codes[r.Read7BitEncodedInt()]);
            }

            int keyCount = r.Read7BitEncodedInt();
            var keys = new string[keyCount];
            var starts = new int[keyCount + 1];
            var ids = new List<int>(keyCount + keyCount / 4);
            string previous = "";
            for (int k = 0; k < keyCount; k++)
            {
                int shared = r.Read7BitEncodedInt();
                string suffix = r.ReadString();
                keys[k] = shared == 0 ? suffix : string.Concat(previous.AsSpan(0, shared), suffix);
                starts[k] = ids.Count;
                int n = r.Read7BitEncodedInt(), last = 0;
                for (int j = 0; j < n; j++) { last += r.Read7BitEncodedInt(); ids.Add(last); }
                previous = keys[k];
            }
            starts[keyCount] = ids.Count;

            int cautionCount = r.Read7BitEncodedInt();
            var cautions = new Dictionary<string, NameCaution>(cautionCount, StringComparer.Ordinal);
            for (int i = 0; i < cautionCount; i++) cautions[r.ReadString()] = (NameCaution)r.ReadByte();

            return (places, NameIndex.FromSorted(keys, starts, [.. ids]), cautions);
        }
        catch (EndOfStreamException e)
        {
            throw new InvalidDataException("gazetteer file is cut short", e);
        }
    }

    private static int SharedPrefix(string a, string b)
    {
        int n = Math.Min(a.Length, b.Length), i = 0;
        while (i < n && a[i] == b[i]) i++;
        // never split a surrogate pair between two keys
        if (i > 0 && char.IsHighSurrogate(a[i - 1])) i--;
        return i;
    }
}
