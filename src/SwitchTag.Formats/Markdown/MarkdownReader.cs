using System.Collections.Immutable;
using System.Text;
using Markdig;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;
using SwitchTag.Formats.Timestamped;

namespace SwitchTag.Formats.Markdown;

/// <summary>Reads a Markdown transcript with Markdig (CommonMark): paragraphs and list items, anywhere
/// in the block tree, are reduced to the plain text of each source line (emphasis, links, code spans
/// and inline HTML give their text; a link's destination is dropped) and fed line by line to the
/// <see cref="EntryCollector"/>, so the typed-transcript conventions apply. Headings become section
/// markers. Code blocks are read as plain lines; HTML blocks are reported.</summary>
public sealed class MarkdownReader : ITranscriptReader
{
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UsePreciseSourceLocation().Build();

    public TranscriptFormat Format => TranscriptFormat.Markdown;
    public IReadOnlyList<string> Aliases { get; } = ["md"];
    public IReadOnlyList<string> Extensions { get; } = [".md", ".markdown"];
    public bool ClaimsExtensions => true;
    public string? MissingSignature => null;

    /// <summary>Lines opening with a timestamp, marked as Markdown or in a .md file.</summary>
    public bool Detects(string text, string extension)
    {
        var scan = EntryScan.Of(text);
        return scan.Entries && EntryScan.IsMarkdown(scan, extension);
    }

    public ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        var document = Markdig.Markdown.Parse(src.Text, Pipeline);
        var collector = new EntryCollector(src, diagnostics);
        foreach (var block in document.Descendants<LeafBlock>())
        {
            switch (block)
            {
                case HeadingBlock heading when !(heading.IsSetext && StartsEntry(src, heading)):
                    collector.Heading(string.Join(' ', Lines(src, heading).Select(l => l.Text.ToString())).Trim());
                    break;
                case HeadingBlock or ParagraphBlock:
                    foreach (var (line, text) in Lines(src, block)) collector.Add(line, text.ToString());
                    break;
                case HtmlBlock html:
                    diagnostics.Warn(html.Line + 1, $"HTML block in a Markdown transcript; not read: {Diagnostics.Quote(html.Lines.ToString())}");
                    break;
                case CodeBlock code:
                    foreach (var line in code.Lines.Lines.Take(code.Lines.Count))
                        collector.Add(line.Line + 1, line.Slice.AsSpan());
                    break;
            }
        }
        return CueChecks.Finish(collector.Build(), overlapAllowed: false, diagnostics);
    }

    private static bool StartsEntry(SourceText src, HeadingBlock heading) =>
        Lines(src, heading) is [var first, ..] && EntryStamp.TryMatch(first.Text.ToString(), out _);

    /// <summary>The plain text of a leaf block, one entry per source line (1-based), in order. Lines
    /// come from each inline's source position (the parse keeps precise locations); inlines arrive in
    /// document order, so a line's text is appended to the last entry or starts a new one.</summary>
    private static List<(int Line, StringBuilder Text)> Lines(SourceText src, LeafBlock block)
    {
        var lines = new List<(int Line, StringBuilder Text)>();
        int line = src.LineOf(Math.Max(0, block.Span.Start));
        if (block.Inline is not null) Walk(src, block.Inline, lines, ref line);
        return lines;
    }

    private static void Walk(SourceText src, ContainerInline container, List<(int Line, StringBuilder Text)> lines, ref int line)
    {
        foreach (var inline in container)
        {
            if (inline.Span.Start >= 0 && inline.Span.Length > 0) line = src.LineOf(inline.Span.Start);
            switch (inline)
            {
                case LiteralInline literal: At(lines, line).Append(literal.Content.AsSpan()); break;
                case CodeInline code: At(lines, line).Append(code.Content); break;
                case HtmlEntityInline entity: At(lines, line).Append(entity.Transcoded.AsSpan()); break;
                case AutolinkInline link: At(lines, line).Append(link.Url); break;
                case ContainerInline inner: Walk(src, inner, lines, ref line); break;
            }
        }
    }

    private static StringBuilder At(List<(int Line, StringBuilder Text)> lines, int line)
    {
        // A later inline never starts on an earlier line; should one, its text stays with the line before.
        if (lines.Count > 0 && lines[^1].Line >= line) return lines[^1].Text;
        lines.Add((line, new StringBuilder()));
        return lines[^1].Text;
    }
}
