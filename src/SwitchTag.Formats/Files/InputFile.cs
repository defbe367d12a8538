namespace SwitchTag.Formats.Files;

/// <summary>One file a run reads. <paramref name="Path"/> is as found (under the input folder, or as
/// named), <paramref name="RealPath"/> has every symbolic link resolved (two inputs with one real path
/// are one file), and <paramref name="Root"/> is the input folder it was found in, or null for a file
/// named directly (see <see cref="InterviewIds"/> for the id it gives).</summary>
public sealed record InputFile(string Path, string RealPath, string? Root);
