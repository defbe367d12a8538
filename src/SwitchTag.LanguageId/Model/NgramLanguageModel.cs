using System.IO.Compression;

namespace SwitchTag.LanguageId.Model;

/// <summary>Multinomial naive Bayes over hashed character 1–5-grams and whole words, with additive
/// smoothing per feature kind. Each kept feature stores, per language that saw it, the quantised
/// gain of its smoothed log-probability over that language's unseen-feature floor; a language
/// that did not keep the feature gets the floor. Scores are tempered by a fitted temperature so
/// the softmax over languages is a usable confidence.</summary>
public sealed class NgramLanguageModel
{
    private const uint Magic = 0x4449_4C53; // "SLID"
    private const int FormatVersion = 2;

    private readonly ulong[] _slots;
    private readonly ushort[] _postings;
    private readonly int _mask;

    /// <summary>Internal classes (e.g. sr-Latn and sr-Cyrl both report sr).</summary>
    public IReadOnlyList<string> Classes { get; }

    /// <summary>ISO 639 code reported for each class.</summary>
    public IReadOnlyList<string> ClassCodes { get; }

    public ModelParameters Parameters { get; }

    /// <summary>Per class and feature kind: log-probability of a feature the class did not keep.</summary>
    private readonly float[] _floor;

    public int ClassCount => Classes.Count;

    public int FeatureCount { get; }

    internal NgramLanguageModel(string[] classes, string[] codes, float[] floor, ModelParameters parameters,
        uint[] keys, byte[] lengths, ushort[] postings)
    {
        Classes = classes;
        ClassCodes = codes;
        _floor = floor;
        Parameters = parameters;
        _postings = postings;
        FeatureCount = keys.Length;
        int capacity = 1;
        // Load factor at most 0.75: linear probing stays short and the table stays small enough to
        // mostly live in cache.
        while (capacity * 3 < keys.Length * 4) capacity <<= 1;
        _mask = capacity - 1;
        _slots = new ulong[capacity];
        int offset = 0;
        for (int k = 0; k < keys.Length; k++)
        {
            int idx = (int)(keys[k] & (uint)_mask);
            while (_slots[idx] != 0) idx = (idx + 1) & _mask;
            // A feature kept by one language (most of them) stores its posting in the slot itself,
            // saving a second memory access; others point into the posting array.
            uint value = lengths[k] == 1 ? InlineFlag | postings[offset] : ((uint)offset << 8) | lengths[k];
            _slots[idx] = ((ulong)keys[k] << 32) | value;
            offset += lengths[k];
        }
        if (offset >= 1 << 23) throw new InvalidDataException("too many postings for the slot layout");
    }

    private const uint InlineFlag = 0x8000_0000;

    /// <summary>Adds the features of one normalised word to <paramref name="acc"/>.</summary>
    [System.Runtime.CompilerServices.SkipLocalsInit]
    public void AddWord(ReadOnlySpan<char> normalizedWord, ScoreAccumulator acc)
    {
        // Collect the word's keys first and touch their slots, so the cache misses of one word
        // overlap instead of queueing one after another.
        Span<uint> keys = stackalloc uint[(NgramHasher.MaxWordChars + 2) * NgramHasher.MaxOrder + 1];
        Span<byte> kinds = stackalloc byte[keys.Length];
        var collect = new CollectSink(keys, kinds);
        NgramHasher.ForEachFeature(normalizedWord, ref collect);
        int n = collect.Count;
        if (System.Runtime.Intrinsics.X86.Sse.IsSupported)
            unsafe
            {
                fixed (ulong* slots = _slots)
                    for (int i = 0; i < n; i++) System.Runtime.Intrinsics.X86.Sse.Prefetch0(slots + (keys[i] & (uint)_mask));
            }
        var gains = acc.Gains;
        var counts = acc.Counts;
        for (int i = 0; i < n; i++) Lookup(keys[i], kinds[i], gains, counts);
    }

    private void Lookup(uint key, int kind, int[] gains, int[] counts)
    {
        var slots = _slots;
        int idx = (int)(key & (uint)_mask);
        while (true)
        {
            ulong slot = slots[idx];
            if (slot == 0) return; // no language kept this feature: it carries no evidence
            if ((uint)(slot >> 32) == key)
            {
                counts[kind]++;
                uint value = (uint)slot;
                if ((value & InlineFlag) != 0)
                {
                    gains[(value >> 8) & 0xFF] += (int)(value & 0xFF);
                    return;
                }
                int offset = (int)(value >> 8), end = offset + (int)(value & 0xFF);
                var postings = _postings;
                for (int p = offset; p < end; p++)
                {
                    ushort v = postings[p];
                    gains[v >> 8] += v & 0xFF;
                }
                return;
            }
            idx = (idx + 1) & _mask;
        }
    }

    /// <summary>Marks in <paramref name="kept"/> (one flag per class) the classes whose training text
    /// had <paramref name="normalizedWord"/> often enough to keep it as a whole word.</summary>
    public void WholeWordClasses(ReadOnlySpan<char> normalizedWord, Span<bool> kept)
    {
        kept.Clear();
        var sink = new WholeWordSink();
        NgramHasher.ForEachFeature(normalizedWord, ref sink);
        if (sink.Key == 0) return;
        int idx = (int)(sink.Key & (uint)_mask);
        while (true)
        {
            ulong slot = _slots[idx];
            if (slot == 0) return;
            if ((uint)(slot >> 32) == sink.Key)
            {
                uint value = (uint)slot;
                if ((value & InlineFlag) != 0) { kept[(int)((value >> 8) & 0xFF)] = true; return; }
                int offset = (int)(value >> 8), end = offset + (int)(value & 0xFF);
                for (int p = offset; p < end; p++) kept[_postings[p] >> 8] = true;
                return;
            }
            idx = (idx + 1) & _mask;
        }
    }

    private struct WholeWordSink : IFeatureSink
    {
        public uint Key;

        public void Add(uint key, int kind)
        {
            if (kind == NgramHasher.WordFeature) Key = key;
        }
    }

    private ref struct CollectSink(Span<uint> keys, Span<byte> kinds) : IFeatureSink
    {
        private readonly Span<uint> _keys = keys;
        private readonly Span<byte> _kinds = kinds;

        public int Count;

        public void Add(uint key, int kind)
        {
            _keys[Count] = key;
            _kinds[Count] = (byte)kind;
            Count++;
        }
    }

    /// <summary>Log-likelihood per class of the features in <paramref name="acc"/> (before temperature).</summary>
    public void LogLikelihoods(ScoreAccumulator acc, Span<float> scores)
    {
        float step = Parameters.QuantStep;
        for (int c = 0; c < ClassCount; c++)
        {
            float s = acc.Gains[c] * step;
            int b = c * NgramHasher.FeatureKinds;
            for (int k = 1; k < NgramHasher.FeatureKinds; k++)
                s += acc.Counts[k] * _floor[b + k];
            scores[c] = s;
        }
    }

    /// <summary>Softmax of tempered scores into <paramref name="probabilities"/> (per class).</summary>
    public void Posterior(ReadOnlySpan<float> scores, Span<float> probabilities)
    {
        float max = float.NegativeInfinity;
        for (int c = 0; c < ClassCount; c++) max = Math.Max(max, scores[c]);
        float sum = 0;
        for (int c = 0; c < ClassCount; c++)
        {
            float e = MathF.Exp((scores[c] - max) * Parameters.Temperature);
            probabilities[c] = e;
            sum += e;
        }
        for (int c = 0; c < ClassCount; c++) probabilities[c] /= sum;
    }

    public static NgramLanguageModel Load(string path)
    {
        using var file = File.OpenRead(path);
        return Read(file);
    }

    public static NgramLanguageModel Read(Stream stream)
    {
        // Decompress in one go, then parse from memory: much faster than a BinaryReader over Brotli.
        var raw = new MemoryStream();
        using (var brotli = new BrotliStream(stream, CompressionMode.Decompress, leaveOpen: true)) brotli.CopyTo(raw);
        var bytes = raw.GetBuffer().AsSpan(0, (int)raw.Length);
        var r = new SpanReader(bytes);
        if (r.UInt32() != Magic || r.Int32() != FormatVersion)
            throw new InvalidDataException("not a SwitchTag language model (or an unsupported version)");
        var parameters = new ModelParameters(r.Single(), r.Single(), r.Single(), r.Single(), r.Single(), r.Single());
        int classCount = r.Int32();
        var classes = new string[classCount];
        var codes = new string[classCount];
        for (int c = 0; c < classCount; c++) { classes[c] = r.String(); codes[c] = r.String(); }
        var floor = new float[classCount * NgramHasher.FeatureKinds];
        for (int i = 0; i < floor.Length; i++) floor[i] = r.Single();
        int keyCount = r.Int32();
        var keys = new uint[keyCount];
        uint previous = 0;
        for (int k = 0; k < keyCount; k++) keys[k] = previous += r.VarUInt32();
        var lengths = r.Bytes(keyCount).ToArray();
        int postingCount = r.Int32();
        var langs = r.Bytes(postingCount);
        var gains = r.Bytes(postingCount);
        var postings = new ushort[postingCount];
        for (int p = 0; p < postingCount; p++) postings[p] = (ushort)((langs[p] << 8) | gains[p]);
        return new NgramLanguageModel(classes, codes, floor, parameters, keys, lengths, postings);
    }

    /// <summary>Little-endian reader matching BinaryWriter's layout (7-bit length-prefixed UTF-8 strings).</summary>
    private ref struct SpanReader(ReadOnlySpan<byte> data)
    {
        private readonly ReadOnlySpan<byte> _data = data;
        private int _pos;

        public ReadOnlySpan<byte> Bytes(int n)
        {
            var slice = _data.Slice(_pos, n);
            _pos += n;
            return slice;
        }

        public uint UInt32() => System.Buffers.Binary.BinaryPrimitives.ReadUInt32LittleEndian(Bytes(4));

        public int Int32() => System.Buffers.Binary.BinaryPrimitives.ReadInt32LittleEndian(Bytes(4));

        public float Single() => System.Buffers.Binary.BinaryPrimitives.ReadSingleLittleEndian(Bytes(4));

        public uint VarUInt32()
        {
            uint value = 0;
            for (int shift = 0; ; shift += 7)
            {
                byte b = _data[_pos++];
                value |= (uint)(b & 0x7F) << shift;
                if (b < 0x80) return value;
            }
        }

        public string String() => System.Text.Encoding.UTF8.GetString(Bytes((int)VarUInt32()));
    }

    /// <summary>Writes the model; <paramref name="features"/> must be sorted by key, each posting list
    /// sorted by class.</summary>
    internal static void Write(Stream stream, string[] classes, string[] codes, float[] floor, ModelParameters parameters,
        IReadOnlyList<(uint Key, (byte Class, byte Gain)[] Postings)> features)
    {
        using var brotli = new BrotliStream(stream, CompressionLevel.SmallestSize, leaveOpen: true);
        using var w = new BinaryWriter(brotli);
        w.Write(Magic);
        w.Write(FormatVersion);
        w.Write(parameters.QuantStep);
        w.Write(parameters.Temperature);
        w.Write(parameters.SwitchCost);
        w.Write(parameters.EmissionCap);
        w.Write(parameters.MainLanguageBonus);
        w.Write(parameters.NameWeight);
        w.Write(classes.Length);
        for (int c = 0; c < classes.Length; c++) { w.Write(classes[c]); w.Write(codes[c]); }
        foreach (var f in floor) w.Write(f);
        w.Write(features.Count);
        uint previous = 0;
        foreach (var (key, _) in features) { w.Write7BitEncodedInt((int)(key - previous)); previous = key; }
        foreach (var (_, postings) in features) w.Write((byte)postings.Length);
        w.Write(features.Sum(f => f.Postings.Length));
        foreach (var (_, postings) in features) foreach (var p in postings) w.Write(p.Class);
        foreach (var (_, postings) in features) foreach (var p in postings) w.Write(p.Gain);
    }
}

/// <summary>Numbers fitted at training time and stored in the model file.</summary>
/// <param name="QuantStep">nats per unit of a stored gain byte</param>
/// <param name="Temperature">multiplies log-likelihoods before the softmax (fitted on the calibration split)</param>
/// <param name="SwitchCost">segmenter: nats paid for a language change between words</param>
/// <param name="EmissionCap">segmenter: a single word can lose at most this much (tempered nats) for a language</param>
/// <param name="MainLanguageBonus">segmenter: per-word prior (tempered nats) for the turn's main language</param>
/// <param name="NameWeight">segmenter: share of a word's evidence that a name-like word carries</param>
public sealed record ModelParameters(float QuantStep, float Temperature, float SwitchCost, float EmissionCap, float MainLanguageBonus, float NameWeight);

/// <summary>Reusable per-call scratch: summed gains per class and feature counts per kind.</summary>
public sealed class ScoreAccumulator(int classCount)
{
    public int[] Gains { get; } = new int[classCount];

    public int[] Counts { get; } = new int[NgramHasher.FeatureKinds];

    public int FeatureHits
    {
        get { int s = 0; foreach (var c in Counts) s += c; return s; }
    }

    public void Clear()
    {
        Array.Clear(Gains);
        Array.Clear(Counts);
    }
}
