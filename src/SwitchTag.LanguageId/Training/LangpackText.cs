using System.IO.Compression;
using System.Text.RegularExpressions;

namespace SwitchTag.LanguageId.Training;

/// <summary>The translated interface strings of a browser language pack (.xpi, a zip of Fluent
/// <c>.ftl</c> and Java-style <c>.properties</c> files): message values and their visible attributes,
/// with placeholders, markup and keyboard-shortcut entries left out. Deterministic: entries in
/// ordinal order of their path.</summary>
public static partial class LangpackText
{
    /// <summary>Fluent attributes that hold shortcut letters, key names or CSS, not words.</summary>
    private static readonly string[] SkippedAttributes = [".accesskey", ".key", ".commandkey", ".style", ".keycode", ".modifiers"];

    public static IEnumerable<string> Read(string xpiPath)
    {
        using var zip = ZipFile.OpenRead(xpiPath);
        foreach (var entry in zip.Entries.OrderBy(e => e.FullName, StringComparer.Ordinal))
        {
            bool fluent = entry.FullName.EndsWith(".ftl", StringComparison.Ordinal);
            if (!fluent && !entry.FullName.EndsWith(".properties", StringComparison.Ordinal)) continue;
            using var reader = new StreamReader(entry.Open());
            var lines = new List<string>();
            while (reader.ReadLine() is { } line) lines.Add(line);
            foreach (var value in fluent ? FluentValues(lines) : PropertiesValues(lines))
            {
                var text = Clean(value);
                if (text.Any(char.IsLetter)) yield return text;
            }
        }
    }

    /// <summary>A Fluent message or term starts at column 0 (<c>id = value</c>); indented lines continue
    /// it, an indented <c>.attr = value</c> starts an attribute; select-expression variants
    /// (<c>[one] text</c>) each become one value.</summary>
    private static IEnumerable<string> FluentValues(List<string> lines)
    {
        string? current = null;
        foreach (var raw in lines)
        {
            if (raw.Length == 0 || raw[0] == '#') { if (current is not null) yield return current; current = null; continue; }
            var line = raw.Trim();
            bool indented = char.IsWhiteSpace(raw[0]);
            int eq = line.IndexOf('=');
            bool attribute = indented && line.StartsWith('.') && eq > 0;
            bool variant = indented && VariantKey().IsMatch(line);
            if (!indented || attribute || variant || line == "}")
            {
                if (current is not null) yield return current;
                current = null;
                if (line == "}") continue;
                if (variant) { current = VariantKey().Replace(line, ""); continue; }
                // Terms (-brand-name) are product names, not words of the language.
                if (eq < 0 || line.StartsWith('-')) continue;
                if (attribute && SkippedAttributes.Contains(line[..eq].Trim(), StringComparer.Ordinal)) continue;
                current = line[(eq + 1)..];
                continue;
            }
            if (current is not null) current += " " + line;
        }
        if (current is not null) yield return current;
    }

    private static IEnumerable<string> PropertiesValues(List<string> lines)
    {
        foreach (var raw in lines)
        {
            var line = raw.Trim();
            if (line.Length == 0 || line[0] is '#' or '!') continue;
            int eq = line.IndexOf('=');
            if (eq <= 0) continue;
            var key = line[..eq].Trim();
            if (key.EndsWith("accesskey", StringComparison.OrdinalIgnoreCase) || key.EndsWith(".key", StringComparison.Ordinal)
                || key.EndsWith("commandkey", StringComparison.OrdinalIgnoreCase)) continue;
            yield return line[(eq + 1)..];
        }
    }

    /// <summary>Drops placeables (<c>{ $n }</c>, <c>{ -brand-name }</c>, and selectors opening on a line),
    /// markup tags, printf placeholders (<c>%S</c>, <c>%1$S</c>) and Java escapes; collapses spaces.</summary>
    private static string Clean(string value)
    {
        var text = Placeable().Replace(value, " ");
        text = Selector().Replace(text, " ");
        text = text.Replace("{", " ").Replace("}", " ");
        text = Markup().Replace(text, " ");
        text = Printf().Replace(text, " ");
        text = text.Replace("\\n", " ").Replace("\\u00A0", " ").Replace("&amp;", "&").Replace("&nbsp;", " ");
        return Spaces().Replace(text, " ").Trim();
    }

    [GeneratedRegex(@"^\*?\[[^\]]+\]\s*")]
    private static partial Regex VariantKey();

    [GeneratedRegex(@"\{[^{}]*\}")]
    private static partial Regex Placeable();

    [GeneratedRegex(@"\{[^{}]*->")]
    private static partial Regex Selector();

    [GeneratedRegex(@"<[^<>]*>")]
    private static partial Regex Markup();

    [GeneratedRegex(@"%(\d+\$)?[SsdDuU@]|\$[A-Z_]+\$?")]
    private static partial Regex Printf();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();
}
