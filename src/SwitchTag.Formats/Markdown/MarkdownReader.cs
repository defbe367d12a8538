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
internal static class MarkdownReader
{
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UsePreciseSourceLocation().Build();

    public static ImmutableArray<Cue>? Read(SourceText src, Diagnostics diagnostics)
    {
        var document = Markdig.Markdown.Parse(src.Text, Pipeline);
        var collector = new EntryCollector(src, diagnostics);
        foreach (var block in document.Descendants<LeafBlock>())
        {
            switch (block)
            {
                case HeadingBlock heading when !(heading.IsSetext && StartsEntry(heading)):
                    collector.Heading(Lines(heading).Select(l => l.Text).DefaultIfEmpty("").Aggregate((a, b) => a + " " + b).Trim());
                    break;
                case HeadingBlock or ParagraphBlock:
                    foreach (var (line, text) in Lines(block)) collector.Add(line, text);
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

    private static bool StartsEntry(HeadingBlock heading) =>
        Lines(heading).FirstOrDefault() is { Text: var t } && EntryStamp.TryMatch(t, out _);

    /// <summary>The plain text of a leaf block, one entry per source line (1-based), in order.</summary>
    private static List<(int Line, string Text)> Lines(LeafBlock block)
    {
        var lines = new SortedDictionary<int, StringBuilder>();
        if (block.Inline is not null) Walk(block.Inline, lines);
        return [.. lines.Select(kv => (kv.Key + 1, kv.Value.ToString()))];
    }

    private static void Walk(ContainerInline container, SortedDictionary<int, StringBuilder> lines)
    {
        foreach (var inline in container)
        {
            switch (inline)
            {
                case LiteralInline literal: At(lines, literal.Line).Append(literal.Content.AsSpan()); break;
                case CodeInline code: At(lines, code.Line).Append(code.Content); break;
                case HtmlEntityInline entity: At(lines, entity.Line).Append(entity.Transcoded.AsSpan()); break;
                case AutolinkInline link: At(lines, link.Line).Append(link.Url); break;
                case LineBreakInline: break;
                case HtmlInline: break;
                case ContainerInline inner: Walk(inner, lines); break;
            }
        }
    }

    private static StringBuilder At(SortedDictionary<int, StringBuilder> lines, int line)
    {
        if (!lines.TryGetValue(line, out var sb)) lines[line] = sb = new StringBuilder();
        return sb;
    }
}
