using SwitchTag.Indexing.Tests.Fakes;
using SwitchTag.Output;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Output.Tests;

/// <summary>Every output of the fixed fixture (fake stages) against the files in Golden/, byte for
/// byte. Set SWITCHTAG_UPDATE_GOLDEN=1 to rewrite them after an intended change, then review the diff.</summary>
public class GoldenFileTests
{
    private static readonly string GoldenDir = Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Output.Tests", "Golden");

    public static TheoryData<string> Files() => new([.. OutputWriters.Default.InterviewFileNames, .. OutputWriters.Default.CollectionFileNames]);

    [Theory]
    [MemberData(nameof(Files))]
    public void Output_matches_its_golden_file(string name)
    {
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-golden-" + Guid.NewGuid().ToString("N"));
        try
        {
            var index = Fixture.Run();
            OutputWriters.Default.WriteInterview(index, Path.Combine(dir, "anna-nowak"));
            OutputWriters.Default.WriteCollection([CollectionEntry.From(index, "anna-nowak")], dir);
            string produced = OutputWriters.Default.CollectionFileNames.Contains(name) ? Path.Combine(dir, name) : Path.Combine(dir, "anna-nowak", name);
            string golden = Path.Combine(GoldenDir, name);
            if (Environment.GetEnvironmentVariable("SWITCHTAG_UPDATE_GOLDEN") == "1")
            {
                Directory.CreateDirectory(GoldenDir);
                File.Copy(produced, golden, overwrite: true);
            }
            Assert.True(File.Exists(golden), $"{golden} is missing; run the tests once with SWITCHTAG_UPDATE_GOLDEN=1");
            Assert.Equal(File.ReadAllBytes(golden), File.ReadAllBytes(produced));
        }
        finally
        {
            if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true);
        }
    }

    [Fact]
    public void No_temporary_files_are_left_beside_the_outputs()
    {
        string dir = Path.Combine(Path.GetTempPath(), "switchtag-atomic-" + Guid.NewGuid().ToString("N"));
        try
        {
            OutputWriters.Default.WriteInterview(Fixture.Run(), dir);
            OutputWriters.Default.WriteInterview(Fixture.Run(), dir); // overwriting goes through the same rename
            Assert.Equal(OutputWriters.Default.InterviewFileNames.Order(StringComparer.Ordinal), Directory.GetFiles(dir).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
