using System.Collections.Immutable;

namespace SwitchTag.LanguageId.Training;

/// <summary>A word list of one class (the words of a spelling dictionary or an OCR model's lexicon):
/// extra vocabulary for the class's character n-gram profile where its running text is thin. It is
/// training material only (a list has no lines to hold out) and is weighted so that it does not
/// outweigh the running text (<see cref="TrainingOptions.VocabularyShare"/>).</summary>
public sealed record Vocabulary(string Class, ImmutableArray<string> Words, string Source)
{
    /// <summary>Reads the <c>&lt;class&gt;.txt</c> files of <paramref name="folder"/> (UTF-8, one word a
    /// line; the class as in the model, e.g. sr-Latn) in ordinal order; blank lines and repeats are
    /// dropped and the words sorted, so the counts do not depend on how a list was written out.</summary>
    public static List<Vocabulary> Load(string folder) =>
        Directory.GetFiles(folder, "*.txt").Order(StringComparer.Ordinal).Select(file =>
        {
            var words = File.ReadLines(file).Select(w => w.Trim()).Where(w => w.Length > 0)
                .Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).ToImmutableArray();
            return new Vocabulary(Path.GetFileNameWithoutExtension(file), words, Path.GetFileName(file));
        }).ToList();
}
