using System.Collections.Immutable;
using System.Text.RegularExpressions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Pipeline.Models;
using SwitchTag.Tagging;
using SwitchTag.Tagging.Sources;
using SwitchTag.Tagging.Sources.Authority;
using SwitchTag.Tagging.Sources.Gazetteer;
using SwitchTag.Tagging.Sources.Model;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Pipeline;

/// <summary><c>switchtag eval ner --per-as-loc</c>: on gold files, how many gold person tokens the
/// tag stage puts inside a place mention, the one error the index must never make. Counted for the
/// shipped cascade and, beside it, for the plain order it replaced (model over gazetteer, no cues,
/// no place evidence, no vetoes); and the other way round, how many gold place tokens each puts inside
/// a person mention (what a rule that yields to the model's persons costs). Each sentence is one turn in the language its file name gives
/// (pl_pdb-ud-test.iob2, multileg-lt-test.tsv), else <c>und</c>.</summary>
public static partial class PersonAsPlaceEvaluation
{
    public static NameEvaluationResult Run(IReadOnlyList<string> goldFiles, TextWriter output, TextWriter error, ModelLocation? models = null)
    {
        if (goldFiles.Count == 0)
        {
            error.WriteLine("switchtag eval ner: give at least one --gold FILE");
            return NameEvaluationResult.NoInput;
        }
        var at = models ?? ModelLocation.Default;
        var model = ShippedModels.LoadNameModel(at, out var loadError);
        if (model is null)
        {
            error.WriteLine($"switchtag eval ner: {loadError}");
            return NameEvaluationResult.ModelNotLoaded;
        }
        var gazetteer = ShippedModels.LoadGazetteer(at);
        var lists = NameListSet.Load(at.PathOf(NameListSet.FolderName));
        var cascade = NameTagger.Create(model, null, gazetteer, TaggingMode.RulesThenModel, lists);
        var plain = new NameTagger(new NameSources()
                .Add(new AuthorityListSource(AuthorityList.Empty)).Add(new GazetteerSource(gazetteer)).Add(new NameModelSource(model)),
            new NamePrecedence([MentionSource.Authority, MentionSource.Model, MentionSource.Gazetteer], [MentionSource.Authority]));

        output.WriteLine($"{"file",-40} {"language",8} {"gold PER tokens",16} {"as LOC, plain",14} {"as LOC, cascade",16} {"gold LOC tokens",16} {"as PER, plain",14} {"as PER, cascade",16}");
        int rejected = 0;
        long persons = 0, plainTotal = 0, cascadeTotal = 0, places = 0, plainPersons = 0, cascadePersons = 0;
        foreach (var file in goldFiles)
        {
            var problems = new List<string>();
            if (!File.Exists(file)) { error.WriteLine($"switchtag eval ner: {file}: no such file"); rejected++; continue; }
            var sentences = GoldReader.Read(file, problems);
            foreach (var p in problems) error.WriteLine($"switchtag eval ner: {p}");
            LanguageCode language = LanguageOf(file);
            long gold = 0, plainHits = 0, cascadeHits = 0, goldPlaces = 0, plainAsPerson = 0, cascadeAsPerson = 0;
            foreach (var s in sentences)
            {
                var starts = new int[s.Words.Count];
                for (int k = 1; k < starts.Length; k++) starts[k] = starts[k - 1] + s.Words[k - 1].Length + 1;
                var text = string.Join(' ', s.Words);
                if (text.Length == 0) continue;
                ImmutableArray<LanguageSpan> spans = [new LanguageSpan(new CharSpan(0, text.Length), language, 1)];
                var plainTags = plain.Tag(new TurnId(0), text, spans);
                var cascadeTags = cascade.Tag(new TurnId(0), text, spans);
                var plainPlaces = Labelled(plainTags, NameLabel.LOC);
                var cascadePlaces = Labelled(cascadeTags, NameLabel.LOC);
                var plainPeople = Labelled(plainTags, NameLabel.PER);
                var cascadePeople = Labelled(cascadeTags, NameLabel.PER);
                for (int k = 0; k < s.Words.Count; k++)
                {
                    int start = starts[k], end = start + s.Words[k].Length;
                    if (s.Tags[k].EndsWith("-PER", StringComparison.Ordinal))
                    {
                        gold++;
                        if (Inside(plainPlaces, start, end)) plainHits++;
                        if (Inside(cascadePlaces, start, end)) cascadeHits++;
                    }
                    else if (s.Tags[k].EndsWith("-LOC", StringComparison.Ordinal))
                    {
                        goldPlaces++;
                        if (Inside(plainPeople, start, end)) plainAsPerson++;
                        if (Inside(cascadePeople, start, end)) cascadeAsPerson++;
                    }
                }
            }
            persons += gold; plainTotal += plainHits; cascadeTotal += cascadeHits;
            places += goldPlaces; plainPersons += plainAsPerson; cascadePersons += cascadeAsPerson;
            output.WriteLine($"{Path.GetFileName(file),-40} {language,8} {gold,16} {plainHits,14} {cascadeHits,16} {goldPlaces,16} {plainAsPerson,14} {cascadeAsPerson,16}");
        }
        output.WriteLine($"{"all",-40} {"",8} {persons,16} {plainTotal,14} {cascadeTotal,16} {places,16} {plainPersons,14} {cascadePersons,16}");
        return rejected > 0 ? NameEvaluationResult.SomeInputsRejected : NameEvaluationResult.Scored;
    }

    private static List<Mention> Labelled(ImmutableArray<Mention> mentions, NameLabel label) => mentions.Where(m => m.Label == label).ToList();

    private static bool Inside(List<Mention> mentions, int start, int end) => mentions.Any(m => m.CharStart <= start && end <= m.CharEnd);

    private static LanguageCode LanguageOf(string file) =>
        FileLanguage().Match(Path.GetFileName(file)) is { Success: true } m ? new LanguageCode(m.Groups[1].Value) : LanguageCode.Undetermined;

    [GeneratedRegex(@"(?:^|[-_])([a-z]{2})(?:[-_.]|$)")]
    private static partial Regex FileLanguage();
}
