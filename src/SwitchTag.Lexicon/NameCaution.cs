namespace SwitchTag.Lexicon;

/// <summary>Why a gazetteer name is risky to tag on its own in running text.</summary>
[Flags]
public enum NameCaution : byte
{
    None = 0,

    /// <summary>Written in lower case in running text of its language ("most", "nice", Polish "moja"):
    /// an ordinary word, so not a name at the start of a sentence.</summary>
    CommonWord = 1,

    /// <summary>Capitalised in mid-sentence in running text of its language for another reason (German
    /// nouns "Straßen", "Montag"; English "English", "German", "Christmas") and naming only small
    /// places: never a place on its own.</summary>
    CapitalisedWord = 2,

    /// <summary>Tagged as a person far more than as a place in NER training data ("David", "Sarah"),
    /// and naming only small places.</summary>
    PersonName = 4,
}
