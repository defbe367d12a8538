using SwitchTag.Core.Text;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>The sentence-start rule. Sentence-ending marks and the closing punctuation passed over
/// follow Unicode UAX #29 (sentence boundaries: STerm, then Close and Sp, then a break; from memory);
/// dashes as breaks follow dialogue and restart conventions (Polish and Russian open a line of speech
/// with a dash, "pauza"; from memory).</summary>
public class TextPositionTests
{
    private static bool StartsAt(string text, string word) => TextPosition.IsSentenceStart(text, text.IndexOf(word, StringComparison.Ordinal));

    [Theory]
    // UAX #29: a break after STerm (. ! ?) followed by spaces.
    [InlineData("It rained. Warsaw was grey.", "Warsaw")]
    [InlineData("Why? Kraków!", "Kraków")]
    // UAX #29: Close (quotes, brackets) after the terminator is passed over.
    [InlineData("He left.\" Anna stayed.", "Anna")]
    [InlineData("Koniec.» Potem", "Potem")]
    // Transcriber remarks in brackets are passed over as a whole.
    [InlineData("Yes. [pause] Lwów", "Lwów")]
    [InlineData("Yes. (laughs) Lwów", "Lwów")]
    // Dialogue lines open with a dash (em dash, en dash, or a hyphen standing alone).
    [InlineData("— Tak, mamo.", "Tak")]
    [InlineData("we went to — Kraków then", "Kraków")]
    [InlineData("we went to – Kraków then", "Kraków")]
    [InlineData("we went to - Kraków then", "Kraków")]
    [InlineData("Warsaw at the start", "Warsaw")]
    public void Opens_a_sentence(string text, string word) => Assert.True(StartsAt(text, word));

    [Theory]
    [InlineData("we went to Kraków then", "Kraków")]
    // A hyphen inside a compound name is no break (the hyphen joins Jean and Pierre).
    [InlineData("and Jean-Pierre said", "Pierre")]
    // A remark inside a sentence passes over to the word before it.
    [InlineData("born in (laughs) Lwów", "Lwów")]
    [InlineData("she said \"Anna\" twice", "Anna")]
    // An unmatched closing bracket is text, not a remark.
    [InlineData("see 2) Berlin", "Berlin")]
    public void Does_not_open_a_sentence(string text, string word) => Assert.False(StartsAt(text, word));
}
