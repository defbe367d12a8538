namespace SwitchTag.Formats.Files;

/// <summary>A path with every symbolic link in it resolved, component by component, as realpath(3)
/// does: two links to one file give one real path, and a link chain that never ends is reported
/// instead of followed. <see cref="Path.GetFullPath(string)"/> only tidies the text, so it cannot
/// tell a link from a folder.</summary>
public static class RealPath
{
    /// <summary>Links followed for one path before giving up, as Linux's ELOOP limit (40).</summary>
    public const int MaxLinks = 40;

    /// <summary>The resolved path, or null with <paramref name="error"/> set when the links loop or
    /// run deeper than <see cref="MaxLinks"/>. A missing component ends resolution: the rest is
    /// appended as written.</summary>
    public static string? Resolve(string path, out string? error)
    {
        error = null;
        string full = Path.GetFullPath(path);
        string root = Path.GetPathRoot(full) ?? "/";
        var rest = new Stack<string>(Parts(full[root.Length..]).Reverse());
        string current = root;
        int links = 0;
        while (rest.TryPop(out var part))
        {
            if (part == ".") continue;
            if (part == "..") { current = Path.GetDirectoryName(current) ?? current; continue; }
            string next = Path.Join(current, part);
            string? target;
            try
            {
                target = new FileInfo(next).LinkTarget;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                target = null;
            }
            if (target is null) { current = next; continue; }
            if (++links > MaxLinks)
            {
                error = $"more than {MaxLinks} symbolic links in a row (a link loop)";
                return null;
            }
            foreach (var t in Parts(target).Reverse()) rest.Push(t);
            if (Path.IsPathRooted(target)) current = Path.GetPathRoot(target) ?? root;
        }
        return current;
    }

    private static IEnumerable<string> Parts(string path) =>
        path.Split([Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>True when <paramref name="path"/> is <paramref name="folder"/> or lies inside it (both
    /// already resolved; compared by whole path components, ordinal).</summary>
    public static bool IsSameOrInside(string path, string folder)
    {
        string f = Path.TrimEndingDirectorySeparator(folder);
        string p = Path.TrimEndingDirectorySeparator(path);
        if (p.Equals(f, StringComparison.Ordinal)) return true;
        return p.StartsWith(f, StringComparison.Ordinal) && (f.EndsWith(Path.DirectorySeparatorChar) || p[f.Length] == Path.DirectorySeparatorChar);
    }
}
