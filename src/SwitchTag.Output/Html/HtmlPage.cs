using SwitchTag.Output.Text;

namespace SwitchTag.Output.Html;

/// <summary>One self-contained page: inline style and, where a page needs one, inline script; nothing
/// is fetched, so a page opens from a file share with no network.</summary>
public static class HtmlPage
{
    private const string Style =
        "body{font-family:system-ui,sans-serif;max-width:76rem;margin:1.5rem auto;padding:0 1rem;line-height:1.45;color:#222}" +
        "h2{border-bottom:1px solid #ddd;padding-bottom:.2rem;margin-top:2rem}h3{margin:1.2rem 0 .3rem}" +
        "table{border-collapse:collapse;margin:.8rem 0;font-size:.92rem}th,td{border:1px solid #ccc;padding:.25rem .5rem;vertical-align:top;text-align:start}" +
        "th{background:#f2f2f2}td.n{text-align:end;font-variant-numeric:tabular-nums}" +
        ".caution{border-left:.3rem solid #c60;background:#fff4e5;margin:1rem 0;padding:.5rem 1rem}" +
        "nav.contents ol{columns:2;margin:.3rem 0}.time{font-variant-numeric:tabular-nums;white-space:nowrap}" +
        ".band{font-size:.8rem;padding:0 .35rem;border-radius:.6rem;white-space:nowrap}.band.high{background:#e3f1e3}.band.check{background:#fde2cf}" +
        "ol.mentions{padding-inline-start:1.4rem}ol.mentions li{margin:.25rem 0}.speaker{color:#555;font-size:.88rem}" +
        "mark{background:#fff0a0;padding:0 .1rem}.ctx{color:#333}.variants{color:#555;font-size:.9rem}" +
        "svg{max-width:100%;height:auto;border:1px solid #ddd;background:#fbfdff}svg .land{fill:#eceae4;stroke:#b9b5aa;stroke-width:.5}" +
        "svg .place{fill:#c0392b;stroke:#fff;stroke-width:1}svg text{font-size:11px;fill:#222;paint-order:stroke;stroke:#fbfdff;stroke-width:3px}" +
        "svg .axis{stroke:#bbb;stroke-width:.5}svg .lbl{font-size:12px}.legend span{display:inline-block;margin-inline-end:1rem}" +
        ".swatch{display:inline-block;width:.9rem;height:.9rem;vertical-align:-.1rem;margin-inline-end:.3rem;border:1px solid #999}" +
        "input[type=search]{font-size:1rem;padding:.3rem .5rem;width:24rem;max-width:100%}button{margin:0 .15rem;cursor:pointer}" +
        ".muted{color:#777}.decided{opacity:.55}";

    /// <summary>Everything before the body; pages are written to their stream as they are made.</summary>
    public static void Start(TextWriter page, string title) =>
        page.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n<title>").Append(HtmlText.Esc(title))
            .Append("</title>\n<style>").Append(Style).Append("</style>\n</head>\n<body>\n");

    /// <summary>Everything after the body.</summary>
    public static void End(TextWriter page, string? script = null)
    {
        if (script is not null) page.Append("<script>\n").Append(script).Append("</script>\n");
        page.Append("</body>\n</html>\n");
    }
}
