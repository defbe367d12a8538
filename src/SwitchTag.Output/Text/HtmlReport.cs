using System.Net;
using Markdig;

namespace SwitchTag.Output.Text;

/// <summary>Renders a Markdown report to one self-contained HTML page (inline style, no external
/// assets). Raw HTML in the Markdown is disabled, so even unescaped text could not inject markup.</summary>
public static class HtmlReport
{
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UsePipeTables().DisableHtml().Build();

    private const string Style =
        "body{font-family:system-ui,sans-serif;max-width:72rem;margin:2rem auto;padding:0 1rem;line-height:1.4;color:#222}" +
        "table{border-collapse:collapse;margin:1rem 0;font-size:.92rem}th,td{border:1px solid #ccc;padding:.25rem .5rem;vertical-align:top}" +
        "th{background:#f2f2f2}blockquote{border-left:.3rem solid #c60;background:#fff4e5;margin:1rem 0;padding:.5rem 1rem}";

    public static string Render(string title, string markdown)
    {
        string body = Markdown.ToHtml(markdown, Pipeline);
        return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>" + WebUtility.HtmlEncode(title) +
               "</title>\n<style>" + Style + "</style>\n</head>\n<body>\n" + body + "</body>\n</html>\n";
    }
}
