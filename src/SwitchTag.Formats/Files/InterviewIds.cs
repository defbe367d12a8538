using System.Collections.Immutable;
using System.Text;

namespace SwitchTag.Formats.Files;

/// <summary>A stable id for each input, the same on every run over the same inputs: the file's path
/// relative to the input folder it was found in, with '/' between folders and without its extension
/// (<c>smith/interview-1</c>); a file named directly is its file name without extension. Two inputs
/// that would share an id both keep their extension (<c>same.vtt</c>, <c>same.srt</c>); should they
/// still share one (one relative path under two input folders), the input folder's name goes in front
/// (<c>archive-a/same</c>), and as a last resort a counter after it (<c>same~2</c>) in path order,
/// which also keeps an id off the ids <c>taken</c> by other interviews of the collection.
/// Ids are compared ignoring case, as a case-insensitive file system would. Text is NFC.</summary>
public static class InterviewIds
{
    /// <param name="taken">Ids that interviews outside <paramref name="files"/> already hold (the
    /// collection store's interviews from other sources), so no two interviews of a collection share one.</param>
    public static ImmutableArray<string> Assign(IReadOnlyList<InputFile> files, IEnumerable<string>? taken = null)
    {
        var ids = files.Select(f => Relative(f, withExtension: false)).ToArray();
        Resolve(ids, i => Relative(files[i], withExtension: true));
        Resolve(ids, i => files[i].Root is { } root ? Join(Path.GetFileName(Path.TrimEndingDirectorySeparator(root)), Relative(files[i], withExtension: false)) : ids[i]);
        var used = new HashSet<string>(taken ?? [], StringComparer.OrdinalIgnoreCase);
        for (int i = 0; i < ids.Length; i++)
        {
            string id = ids[i];
            for (int k = 2; !used.Add(id); k++) id = $"{ids[i]}~{k}";
            ids[i] = id;
        }
        return [.. ids];
    }

    /// <summary>Gives every id shared by more than one input the alternative <paramref name="other"/>.</summary>
    private static void Resolve(string[] ids, Func<int, string> other)
    {
        var shared = ids.GroupBy(id => id, StringComparer.OrdinalIgnoreCase).Where(g => g.Count() > 1).Select(g => g.Key)
            .ToHashSet(StringComparer.OrdinalIgnoreCase);
        for (int i = 0; i < ids.Length; i++)
            if (shared.Contains(ids[i])) ids[i] = other(i);
    }

    private static string Relative(InputFile file, bool withExtension)
    {
        string relative = file.Root is null ? Path.GetFileName(file.Path) : Path.GetRelativePath(file.Root, file.Path);
        if (!withExtension) relative = Path.ChangeExtension(relative, null);
        return relative.Replace(Path.DirectorySeparatorChar, '/').Normalize(NormalizationForm.FormC);
    }

    private static string Join(string root, string id) => root.Length == 0 ? id : root + "/" + id;
}
