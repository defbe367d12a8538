using SwitchTag.Core.Documents;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Every accepted input the format tests read, by name, so the invariant and "nothing lost"
/// tests can run over all of them.</summary>
public static class Samples
{
    // (from memory of the W3C WebVTT spec, section 1.1 "A simple caption file", abridged to the
    // cues shown; the spec's introduction example of a conversation with voice spans and settings)
    public const string SpecIntroduction = """
        WEBVTT

        00:11.000 --> 00:13.000
        <v Roger Bingham>We are in New York City

        00:13.000 --> 00:16.000
        <v Roger Bingham>We're actually at the Lucern Hotel, just down the street

        00:16.000 --> 00:18.000
        <v Roger Bingham>from the American Museum of Natural History

        00:18.000 --> 00:20.000
        <v Roger Bingham>And with me is Neil deGrasse Tyson

        00:20.000 --> 00:22.000
        <v Roger Bingham>Astrophysicist, Director of the Hayden Planetarium

        00:22.000 --> 00:24.000
        <v Roger Bingham>at the AMNH.

        00:24.000 --> 00:26.000
        <v Roger Bingham>Thank you for walking down here.

        00:27.000 --> 00:30.000
        <v Roger Bingham>And I want to do a follow-up on the last conversation we did.

        00:30.000 --> 00:31.500 align:right size:50%
        <v Neil deGrasse Tyson>When we e-mailed—

        00:30.500 --> 00:32.500 align:left size:50%
        <v Roger Bingham>Didn't we talk about enough in that conversation?

        00:32.000 --> 00:35.500 align:right size:50%
        <v Neil deGrasse Tyson>No! No no no no; 'cos 'cos obviously 'cos

        00:32.500 --> 00:33.500 align:left size:50%
        <v Roger Bingham><i>Laughs</i>

        00:35.500 --> 00:38.000
        <v Neil deGrasse Tyson>You know I'm so excited my glasses are falling off here.
        """;

    // (from memory of the W3C WebVTT spec, section 1.3 "Comments": NOTE blocks and cue identifiers)
    public const string SpecComments = """
        WEBVTT

        NOTE
        This file was written by Jill. I hope
        you enjoy reading it. Some things to
        bear in mind:
        - I was lip-reading, so the cues may
        not be 100% accurate
        - I didn’t pay too close attention to
        when the cues should start or end.

        1
        00:01.000 --> 00:04.000
        Never drink liquid nitrogen.

        NOTE check next cue

        2
        00:05.000 --> 00:09.000
        — It will perforate your stomach.
        — You could die.

        NOTE end of file
        """;

    // (from memory of the W3C WebVTT spec, section 1.4 "Styling": STYLE blocks before the first cue)
    public const string SpecStyling = """
        WEBVTT

        STYLE
        ::cue {
          background-image: linear-gradient(to bottom, dimgray, lightgray);
          color: papayawhip;
        }
        /* Style blocks cannot use blank lines nor "dash dash greater than" */

        NOTE comment blocks can be used between style blocks.

        STYLE
        ::cue(b) {
          color: peachpuff;
        }

        00:00:00.000 --> 00:00:10.000
        - Hello <b>world</b>.

        NOTE style blocks cannot appear after the first cue.
        """;

    // (from memory of the W3C WebVTT spec, section 1.5 "Other features", regions example)
    public const string SpecRegions = """
        WEBVTT

        REGION
        id:fred
        width:40%
        lines:3
        regionanchor:0%,100%
        viewportanchor:10%,90%
        scroll:up

        REGION
        id:bill
        width:40%
        lines:3
        regionanchor:100%,100%
        viewportanchor:90%,90%
        scroll:up

        00:00:00.000 --> 00:00:20.000 region:fred align:left
        <v Fred>Hi, my name is Fred

        00:00:02.500 --> 00:00:22.500 region:bill align:right
        <v Bill>Hi, I’m Bill

        00:00:05.000 --> 00:00:25.000 region:fred align:left
        <v Fred>Would you like to get a coffee?

        00:00:07.500 --> 00:00:27.500 region:bill align:right
        <v Bill>Sure! I’ve only had one today.

        00:00:10.000 --> 00:00:30.000 region:fred align:left
        <v Fred>This is my fourth!

        00:00:12.500 --> 00:00:32.500 region:bill align:right
        <v Bill>OK, let’s go.
        """;

    // (from memory of the W3C WebVTT spec, section 1.5: karaoke-style cues with inline timestamps,
    // MM:SS.mmm and HH:MM:SS.mmm forms mixed)
    public const string SpecKaraoke = """
        WEBVTT

        00:16.500 --> 00:18.500
        When the moon <00:17.500>hits your eye

        00:00:18.500 --> 00:00:20.500
        Like a <00:19.000>big-a <00:19.500>pizza <00:20.000>pie

        00:00:20.500 --> 00:00:21.500
        That's <00:00:21.000>amore
        """;

    // (from memory of the W3C WebVTT spec, the voice span example with classes and several voices
    // in one cue, section 4 "WebVTT cue text": "<v.first.loud Esme>It’s a blue apple tree!")
    public const string SpecVoiceClasses = """
        WEBVTT

        00:00:00.000 --> 00:00:05.000
        <v.first.loud Esme>It’s a blue apple tree!</v>
        <v Mary>No way!</v>
        <v Esme>Hee!</v> <i>laughter</i>
        <v.loud Mary>That’s awesome!</v>
        """;

    /// <summary>Every span type of WebVTT cue text, character references, a cue identifier and a
    /// header line with text (W3C WebVTT grammar, from memory: cue components and character references).</summary>
    public const string WebVttAllMarkup = """
        WEBVTT - interview tape 3
        Kind: captions

        intro-1
        00:00:01.000 --> 00:00:04.000 line:90% align:center
        <v.narrator Anna Nowak>I was born in <lang pl>Krakowie</lang>, <i>you</i> <b>know</b>,
        <c.yellow.bg_blue>near</c> <u>the</u> river &amp; the &lt;castle&gt;&nbsp;hill.

        00:00:04.000 --> 00:00:06.500
        <v Anna Nowak><ruby>漢<rt>kan</rt>字<rt>ji</rt></ruby> and &#x1F600; &#233;t&#xE9;&lrm;&rlm;
        """;

    public const string Srt = """
        1
        00:00:01,000 --> 00:00:03,500
        INTERVIEWER: Where were <i>you</i> born?

        2
        00:00:03,600 --> 00:00:07,000
        MARIA DE LA CRUZ: In <font color="#ffff00">Sevilla</font>,
        in <b>nineteen</b> thirty.

        3
        00:00:07,100 --> 00:00:09,000
        {\an8}And then we left.

        4
        00:00:09,100 --> 00:00:12,000
        Interviewer: Why did you <u>leave</u>?
        """;

    public const string Text = """
        [00:00:01] INTERVIEWER: Where were you born?
        [00:00:04] MARIA: In Sevilla.
        We left in 1936.
          Then Lisboa.
        (00:20) And later Brazil.
        00:00:30 - INTERVIEWER: When?
        [0:00:35.5] MARIA: In the winter.
        INTERVIEWER: Which year?
        [00:00:40]
        """;

    public const string Markdown = """
        # Interview with Maria

        ## Childhood

        **[00:00:01] INTERVIEWER:** Where were you *born*?

        **[00:00:04] MARIA:** In [Sevilla](https://example.org/sevilla), near the
        river, `Guadalquivir`.

        A second paragraph of Maria &amp; her brother.

        ## Emigration

        - [00:00:20] INTERVIEWER: When did you leave?
        - [00:00:25] MARIA: In __1936__.
        """;

    public static IEnumerable<(string Name, string Path, string Text)> All =>
    [
        ("spec-introduction", "spec-introduction.vtt", SpecIntroduction),
        ("spec-comments", "spec-comments.vtt", SpecComments),
        ("spec-styling", "spec-styling.vtt", SpecStyling),
        ("spec-regions", "spec-regions.vtt", SpecRegions),
        ("spec-karaoke", "spec-karaoke.vtt", SpecKaraoke),
        ("spec-voice-classes", "spec-voice-classes.vtt", SpecVoiceClasses),
        ("webvtt-all-markup", "all-markup.vtt", WebVttAllMarkup),
        ("srt", "interview.srt", Srt),
        ("text", "interview.txt", Text),
        ("markdown", "interview.md", Markdown),
    ];

    public static TheoryData<string> Names()
    {
        var data = new TheoryData<string>();
        foreach (var s in All) data.Add(s.Name);
        return data;
    }

    public static (string Path, string Text) Get(string name)
    {
        var s = All.Single(x => x.Name == name);
        return (s.Path, s.Text);
    }

    public static Transcript Read(string name) => ReadWithText(name).Transcript!;

    public static ReadResult ReadWithText(string name)
    {
        var (path, text) = Get(name);
        return Reads.AcceptedRead(path, text);
    }
}
