using SwitchTag.Core.Documents;
using SwitchTag.Formats.Markdown;
using SwitchTag.Formats.Srt;
using SwitchTag.Formats.Timestamped;
using SwitchTag.Formats.WebVtt;

namespace SwitchTag.Formats;

/// <summary>The registry of transcript readers. Detection asks each reader in registration order and
/// takes the first that recognises the content (FORMATS.md, "Detection").</summary>
public sealed class TranscriptReaders
{
    private readonly List<ITranscriptReader> _readers = [];

    public static TranscriptReaders Default { get; } = new TranscriptReaders()
        .Add(new WebVttReader())
        .Add(new SrtReader())
        .Add(new TimestampedTextReader())
        .Add(new MarkdownReader());

    public IReadOnlyList<ITranscriptReader> All => _readers;

    public TranscriptReaders Add(ITranscriptReader reader)
    {
        if (Find(reader.Format.Name) is not null || reader.Aliases.Any(a => Find(a) is not null))
            throw new ArgumentException($"a reader named {reader.Format.Name} is already registered");
        _readers.Add(reader);
        return this;
    }

    /// <summary>The reader of a format name or alias, any case; null when none.</summary>
    public ITranscriptReader? Find(string name)
    {
        string key = name.Trim().ToLowerInvariant();
        return _readers.FirstOrDefault(r => r.Format.Name == key || r.Aliases.Contains(key));
    }

    public ITranscriptReader? Find(TranscriptFormat format) => _readers.FirstOrDefault(r => r.Format == format);

    /// <summary>Every extension a folder walk picks up.</summary>
    public IReadOnlyList<string> Extensions => [.. _readers.SelectMany(r => r.Extensions).Distinct()];

    /// <summary>The format names for a usage message: "a, b, c or d".</summary>
    public string NameList
    {
        get
        {
            var names = _readers.Select(r => r.Format.Name).ToList();
            return names.Count < 2 ? string.Concat(names) : string.Join(", ", names[..^1]) + " or " + names[^1];
        }
    }

    /// <summary>The reader whose content test <paramref name="text"/> passes first, or null.</summary>
    public ITranscriptReader? Detect(string text, string? extension)
    {
        string ext = extension ?? "";
        return _readers.FirstOrDefault(r => r.Detects(text, ext));
    }

    /// <summary>The reader the file's extension promises, or null (.txt promises nothing).</summary>
    public ITranscriptReader? ClaimedBy(string extension)
    {
        string ext = extension.ToLowerInvariant();
        return _readers.FirstOrDefault(r => r.ClaimsExtensions && r.Extensions.Contains(ext));
    }
}
