using SwitchTag.Core.Documents;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.Report;

/// <summary><c>index.html</c>: the readable report of <see cref="ReportMarkdownWriter"/> as one
/// self-contained page.</summary>
public sealed class ReportHtmlWriter : IInterviewWriter
{
    public string FileName => "index.html";

    public void Write(InterviewIndex index, Stream stream) =>
        Utf8Text.Write(stream, HtmlReport.Render($"Interview index: {index.Transcript.Name}", ReportMarkdownWriter.Render(index)));
}
