using SwitchTag.Formats.Files;
using SwitchTag.Output;
using Xunit;

namespace SwitchTag.Output.Tests;

/// <summary>The interview folder name rule (SCHEMA.md, "Interview folders"). Path rules: POSIX
/// pathname resolution gives "." and ".." their meaning; Windows reserves CON, PRN, AUX, NUL, COM1-9 and
/// LPT1-9 even with an extension and forbids &lt; &gt; : " / \ | ? * (from memory of the Win32 file
/// naming documentation).</summary>
public class InterviewFolderNameTests
{
    [Theory]
    [InlineData("..", "interview")]     // issue reproduction: a file named "...txt" wrote into the parent of --out
    [InlineData(".", "interview")]      // and "..txt" into the --out root
    [InlineData("...", "interview")]
    [InlineData("", "interview")]
    [InlineData("a/b\\c", "a_b_c")]
    [InlineData("../../etc/passwd", "_.._etc_passwd")]
    [InlineData(".hidden", "hidden")]
    [InlineData("trailing. ", "trailing")]
    [InlineData("CON", "CON_")]
    [InlineData("nul.txt", "nul_.txt")]
    [InlineData("what?*:<>|\"", "what_______")]
    [InlineData("tab\there", "tab_here")]
    [InlineData("Krako\u0301w", "Kraków")]
    public void Names_become_one_safe_path_component(string input, string expected)
    {
        string name = InterviewFolderName.Clean(input);
        Assert.Equal(expected, name);
        Assert.Equal(name, Path.GetFileName(name));
        Assert.NotEqual(".", name);
        Assert.NotEqual("..", name);
    }

    [Fact]
    public void Long_names_are_cut_and_never_split_a_surrogate_pair()
    {
        string name = InterviewFolderName.Clean(new string('a', InterviewFolderName.MaxLength - 1) + "😀tail");
        Assert.Equal(new string('a', InterviewFolderName.MaxLength - 1), name);
    }

    [Fact]
    public void Names_are_unique_in_a_run_and_never_a_run_file()
    {
        // Issue reproduction: a file named collection.json.txt blocked the collection index.
        var names = new InterviewFolderName();
        Assert.Equal("collection.json-2", names.Next("collection.json"));
        Assert.Equal("same", names.Next("same"));
        Assert.Equal("Same-2", names.Next("Same"));  // case-insensitive file systems
        Assert.Equal("same-3", names.Next("same"));
        Assert.Equal("interview", names.Next(".."));
        Assert.Equal("interview-2", names.Next("."));
    }

    [Fact]
    public void Readers_and_writers_agree_on_the_tools_output_file_names()
    {
        Assert.Equal(OutputWriters.Default.InterviewFileNames, ToolOutputs.FileNames);
        Assert.Equal(InterviewFolderName.RunFileNames, ToolOutputs.CollectionFileNames);
    }
}
