using System.Text;

namespace SwitchTag.Output;

/// <summary>The rule that turns an interview's id (or name) into the name of its folder under the
/// output folder, so that no input name can lead a write anywhere else:
/// <list type="number">
/// <item>NFC; every character that is a path separator (<c>/</c>, <c>\</c>), a control character or one
/// Windows forbids in names (<c>&lt; &gt; : " | ? *</c>) becomes <c>_</c>;</item>
/// <item>spaces and dots are trimmed from both ends (a leading dot would hide the folder, a trailing
/// one vanishes on Windows), so <c>.</c>, <c>..</c> and <c>...</c> cannot survive;</item>
/// <item>an empty result becomes <c>interview</c>; a Windows device name (CON, NUL, COM1, …, also with
/// an extension) gets a <c>_</c> after it; the name is cut to <see cref="MaxLength"/> characters (never inside a surrogate pair);</item>
/// <item>a name equal, ignoring case, to one of the run's own files in the output root
/// (<c>collection.json</c>, <c>collection.html</c>) or to a folder already taken in this run gets
/// <c>-2</c>, <c>-3</c>, … after it.</item>
/// </list>
/// The result is a single path component, never <c>.</c> or <c>..</c>, and unique in the run.</summary>
public sealed class InterviewFolderName
{
    /// <summary>Characters kept of a name: with four UTF-8 bytes a character at most and a counter
    /// suffix, still inside the 255-byte name limit of common file systems.</summary>
    public const int MaxLength = 60;

    public static readonly IReadOnlyList<string> RunFileNames = ["collection.json", "collection.html"];

    private static readonly HashSet<string> DeviceNames = new(StringComparer.OrdinalIgnoreCase)
    {
        "CON", "PRN", "AUX", "NUL", "COM1", "COM2", "COM3", "COM4", "COM5", "COM6", "COM7", "COM8", "COM9",
        "LPT1", "LPT2", "LPT3", "LPT4", "LPT5", "LPT6", "LPT7", "LPT8", "LPT9",
    };

    private readonly HashSet<string> taken;

    /// <summary>A run's names; <paramref name="alreadyTaken"/> are folders earlier runs gave (the collection store's).</summary>
    public InterviewFolderName(IEnumerable<string>? alreadyTaken = null) =>
        taken = new HashSet<string>(RunFileNames.Concat(alreadyTaken ?? []), StringComparer.OrdinalIgnoreCase);

    /// <summary>The folder for the next interview of the run.</summary>
    public string Next(string idOrName)
    {
        string name = Clean(idOrName);
        string folder = name;
        for (int k = 2; !taken.Add(folder); k++) folder = $"{name}-{k}";
        return folder;
    }

    /// <summary>Steps 1-3 of the rule: a safe single path component, not yet made unique.</summary>
    public static string Clean(string? idOrName)
    {
        string text = (idOrName ?? "").Normalize(NormalizationForm.FormC);
        var sb = new StringBuilder(text.Length);
        foreach (char c in text)
            sb.Append(c is '/' or '\\' or '<' or '>' or ':' or '"' or '|' or '?' or '*' || char.IsControl(c) ? '_' : c);
        string name = sb.ToString().Trim(' ', '.');
        if (name.Length > MaxLength)
        {
            int keep = char.IsHighSurrogate(name[MaxLength - 1]) ? MaxLength - 1 : MaxLength;
            name = name[..keep].TrimEnd(' ', '.');
        }
        if (name.Length == 0) return "interview";
        string stem = name.Split('.')[0];
        return DeviceNames.Contains(stem) ? stem + "_" + name[stem.Length..] : name;
    }
}
