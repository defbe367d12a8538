using System.CommandLine;

namespace SwitchTag.Cli;

/// <summary>A command whose argument takes any number of paths would otherwise swallow a mistyped
/// option (<c>--jobz</c>) as a path and report "no such file"; this names it as the usage error it is.</summary>
internal static class UnknownOptions
{
    public static void RejectIn(Argument<string[]> paths) => paths.Validators.Add(result =>
    {
        foreach (var token in result.Tokens)
            if (token.Value.Length > 1 && token.Value[0] == '-' && !File.Exists(token.Value) && !Directory.Exists(token.Value))
                result.AddError($"unknown option {token.Value}");
    });
}
