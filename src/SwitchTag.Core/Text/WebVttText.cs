using System.Text;

namespace SwitchTag.Core.Text;

/// <summary>Plain text made safe as WebVTT cue text (W3C WebVTT: '&amp;' and '&lt;' must be escaped in
/// cue text; '&gt;' is escaped too so that "-->" can never appear).</summary>
public static class WebVttText
{
    public static string Escape(string plain)
    {
        if (plain is null) return "";
        if (plain.AsSpan().IndexOfAny('&', '<', '>') < 0) return plain;
        var sb = new StringBuilder(plain.Length + 16);
        foreach (char c in plain)
        {
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                default: sb.Append(c); break;
            }
        }
        return sb.ToString();
    }
}
