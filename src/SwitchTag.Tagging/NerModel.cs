using System.Collections.Concurrent;
using System.Text.Json;
using Microsoft.ML.OnnxRuntime;
using Microsoft.ML.OnnxRuntime.Tensors;

namespace SwitchTag.Tagging;

/// <summary>The shipped word-level name classifier: <c>ner.onnx</c> (inputs <c>features</c>
/// [batch, words, FeatureSlots] and <c>pieces</c> [batch, words, 4], int64; output <c>logits</c> [batch, words,
/// labels]), <c>ner.spm</c> (SentencePiece), <c>ner.labels.json</c> (labels and feature layout) and,
/// when the layout names one, the name lexicon the model was trained with.
/// Thread-safe; <see cref="Shared"/> keeps one ONNX Runtime session per models folder per process.</summary>
public sealed class NerModel : IDisposable
{
    private static readonly ConcurrentDictionary<string, Lazy<NerModel>> Loaded = new();
    private readonly InferenceSession _session;
    private readonly WordFeatures _features;
    private readonly PieceEncoder _pieces;

    public IReadOnlyList<string> Labels { get; }

    /// <summary>Feature ids per word, as <c>ner.labels.json</c> lays them out.</summary>
    public int FeatureSlots => _features.Slots;

    private NerModel(string directory)
    {
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(directory, "ner.labels.json")));
        var root = json.RootElement;
        Labels = [.. root.GetProperty("labels").EnumerateArray().Select(e => e.GetString()!)];
        var lexicon = root.TryGetProperty("lexicon", out var lex)
            ? NameLexicon.Load(Path.Combine(directory, lex.GetString()!))
            : null;
        _features = new WordFeatures(root.GetProperty("hashRows").GetInt32(), lexicon);
        if (root.GetProperty("featureSlots").GetInt32() != _features.Slots || root.GetProperty("pieceSlots").GetInt32() != PieceEncoder.Slots)
            throw new InvalidDataException("ner.labels.json: feature layout does not match this build");
        using (var sp = File.OpenRead(Path.Combine(directory, root.GetProperty("pieceModel").GetString()!)))
            _pieces = new PieceEncoder(sp);
        var options = new SessionOptions
        {
            IntraOpNumThreads = 1,
            InterOpNumThreads = 1,
            ExecutionMode = ExecutionMode.ORT_SEQUENTIAL,
            GraphOptimizationLevel = GraphOptimizationLevel.ORT_ENABLE_ALL,
            // A planned block per input shape, kept for the session's life: batch widths vary (a
            // turn's last window, short sentences), and without the plans the arena holds 25 MB
            // less at the same speed (one 50k-cue turn tagged alone: peak 278 -> 252 MB, 5.2 CPU s
            // both). Turning the arena itself off was slower and held more.
            EnableMemoryPattern = false,
        };
        _session = new InferenceSession(Path.Combine(directory, "ner.onnx"), options);
    }

    /// <summary>Loads a model folder (ner.onnx, ner.spm, ner.labels.json, the lexicon it names); throws when files are missing or malformed.</summary>
    public static NerModel Load(string directory) => new(directory);

    /// <summary>The process-wide instance for <paramref name="directory"/>, loaded on first use.</summary>
    public static NerModel Shared(string directory) =>
        Loaded.GetOrAdd(Path.GetFullPath(directory), d => new Lazy<NerModel>(() => new NerModel(d))).Value;

    /// <summary>Feature and piece ids of <paramref name="words"/> (the sentence they stand in, for
    /// the sentence-initial flag), written row by row into the given buffers.</summary>
    public void Featurize(IReadOnlyList<string> words, int from, int count, Span<long> features, Span<long> pieces)
    {
        // Each word is read once: a list may cut a word's text out of the turn on every read.
        string? previous = from > 0 ? words[from - 1] : null;
        for (int i = 0; i < count; i++)
        {
            string word = words[from + i];
            _features.Compute(word, WordFeatures.IsSentenceInitial(previous), features.Slice(i * FeatureSlots, FeatureSlots));
            _pieces.Encode(word).CopyTo(pieces.Slice(i * PieceEncoder.Slots, PieceEncoder.Slots));
            previous = word;
        }
    }

    /// <summary>Runs the network on a padded batch (rows of all-zero features are padding); the
    /// buffers may be longer than the batch, whose values are at their start. With
    /// <paramref name="releaseArena"/> ONNX Runtime gives the arena's free blocks back to the system
    /// after the run: the last batch of a long turn, whose blocks would otherwise be held, unused,
    /// through every later stage and output file.</summary>
    public float[] Run(Memory<long> features, Memory<long> pieces, int batch, int words, bool releaseArena = false)
    {
        var inputs = new[]
        {
            NamedOnnxValue.CreateFromTensor("features", new DenseTensor<long>(features[..(batch * words * FeatureSlots)], [batch, words, FeatureSlots])),
            NamedOnnxValue.CreateFromTensor("pieces", new DenseTensor<long>(pieces[..(batch * words * PieceEncoder.Slots)], [batch, words, PieceEncoder.Slots])),
        };
        using var options = new RunOptions();
        if (releaseArena) options.AddRunConfigEntry("memory.enable_memory_arena_shrinkage", "cpu:0");
        using var results = _session.Run(inputs, _session.OutputNames, options);
        return results[0].AsTensor<float>().ToArray();
    }

    public void Dispose() => _session.Dispose();
}
