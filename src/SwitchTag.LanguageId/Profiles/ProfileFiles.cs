namespace SwitchTag.LanguageId.Profiles;

/// <summary>Reads the word lists embedded from <c>Profiles/&lt;code&gt;/&lt;file&gt;</c>: one entry a
/// line, blank lines and <c>#</c> comments skipped.</summary>
public static class ProfileFiles
{
    public static IEnumerable<(string Code, string Entry)> Read(string file)
    {
        var assembly = typeof(ProfileFiles).Assembly;
        foreach (var name in assembly.GetManifestResourceNames().Order(StringComparer.Ordinal))
        {
            var parts = name.Split('/', '\\');
            if (parts.Length != 3 || parts[0] != "Profiles" || parts[2] != file) continue;
            using var reader = new StreamReader(assembly.GetManifestResourceStream(name)!);
            while (reader.ReadLine() is { } line)
            {
                var entry = line.Trim();
                if (entry.Length > 0 && entry[0] != '#') yield return (parts[1], entry);
            }
        }
    }
}
