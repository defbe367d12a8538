using System.Globalization;
using System.Net;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;

namespace SwitchTag.Output.Html;

/// <summary>The small pieces every page is built from. Anything that came from a transcript goes
/// through <see cref="Said"/> (escaped, and <c>dir="auto"</c> so a Yiddish or Hebrew stretch keeps its
/// punctuation on the right side); every other string through <see cref="Esc"/>. Both show control and
/// bidi-override characters as visible marks (<see cref="DisplayText"/>), so a transcript cannot reorder
/// or hide what a reader sees; <see cref="Attr"/> keeps a value exact for a script to send back.</summary>
public static class HtmlText
{
    /// <summary>At or above this confidence a name shows as "high", below it as "check".</summary>
    public const double HighConfidence = 0.8;

    public static string Esc(string? text) => WebUtility.HtmlEncode(DisplayText.Neutralise(text));

    /// <summary>An attribute value a page's script reads back into a decisions file (a mention's text,
    /// a heading id, an interview id), escaped but otherwise exact so the decision matches again.</summary>
    public static string Attr(string? text) => WebUtility.HtmlEncode(text ?? "");

    public static string Said(string? text) => $"<span dir=\"auto\">{Esc(text)}</span>";

    /// <summary>A time as people read it in a recording: <c>H:MM:SS</c>, the exact time on hover.</summary>
    public static string Clock(Timecode t)
    {
        long s = Math.Max(0, t.Milliseconds) / 1000;
        return string.Create(CultureInfo.InvariantCulture, $"{s / 3600}:{s / 60 % 60:00}:{s % 60:00}");
    }

    public static string Clock(double seconds) => Clock(Timecode.FromSeconds(seconds));

    public static string Clock(Duration d) => Clock(new Timecode(d.Milliseconds));

    /// <summary>A time that opens the recording there when one is known (W3C Media Fragments <c>#t=</c>).</summary>
    public static string TimeLink(Timecode t, string? media)
    {
        if (media is null) return $"<span class=\"time\" title=\"{t}\">{Clock(t)}</span>";
        int hash = media.IndexOf('#');
        string url = (hash < 0 ? media : media[..hash]) + "#t=" + t.ToSecondsString();
        return $"<a class=\"time\" href=\"{Esc(url)}\" title=\"{t}\">{Clock(t)}</a>";
    }

    /// <summary>A confidence as a plain band with the number on hover.</summary>
    public static string Band(double confidence)
    {
        string number = confidence.ToString("0.00", CultureInfo.InvariantCulture);
        return confidence >= HighConfidence
            ? $"<span class=\"band high\" title=\"confidence {number}\">high</span>"
            : $"<span class=\"band check\" title=\"confidence {number}\">check</span>";
    }

    /// <summary>An element id from a heading id (ids are slugs, but escaping costs nothing).</summary>
    public static string HeadingAnchor(HeadingId headingId) => "h-" + headingId.Value;

    public static string Number(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
