using System.Collections.Immutable;

namespace SwitchTag.Formats.Files;

/// <summary>How an output folder sits against the inputs, compared by real paths (links resolved,
/// <see cref="RealPath"/>), for a caller that must refuse to write where it reads:
/// <list type="bullet">
/// <item><see cref="OutputConflict.OutputInsideInput"/>: the output folder is an input folder or lies
/// inside one, so a later walk of that input reads the outputs back (a caller refuses this unless told
/// otherwise, and then passes <see cref="OutputConflict.Output"/> to <see cref="InputWalker.Find"/> as a
/// folder never to walk);</item>
/// <item><see cref="OutputConflict.InputInsideOutput"/>: an input (file or folder) lies inside the
/// output folder, so writing may replace a transcript (<c>--out archive</c> over <c>archive/smith/index.md</c>).</item>
/// </list></summary>
public static class OutputSafety
{
    public static ImmutableArray<OutputConflict> Check(string outputFolder, IEnumerable<string> inputs)
    {
        string output = RealPath.Resolve(outputFolder, out _) ?? Path.GetFullPath(outputFolder);
        var conflicts = ImmutableArray.CreateBuilder<OutputConflict>();
        foreach (var input in inputs)
        {
            string? real = RealPath.Resolve(input, out _);
            if (real is null) continue;
            if (FileKinds.Of(real) == FileKind.Directory && RealPath.IsSameOrInside(output, real))
                conflicts.Add(new OutputConflict(OutputConflict.OutputInsideInput, input, real, output));
            else if (RealPath.IsSameOrInside(real, output))
                conflicts.Add(new OutputConflict(OutputConflict.InputInsideOutput, input, real, output));
        }
        return conflicts.ToImmutable();
    }
}

/// <summary>One input that the output folder <paramref name="Output"/> (real path) would clash with.</summary>
public sealed record OutputConflict(string Kind, string Input, string RealInput, string Output)
{
    public const string OutputInsideInput = "output-inside-input";
    public const string InputInsideOutput = "input-inside-output";

    public override string ToString() => Kind == OutputInsideInput
        ? $"the output folder {Output} is the input folder {Input} or lies inside it; its outputs would be read back as transcripts"
        : $"the input {Input} lies inside the output folder {Output}; writing there may replace it";
}
