using System.Diagnostics;
using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;

// Converts a GeoNames cities dump into the compact gazetteer file and prints what went in, the
// file's size and how long loading it takes (best of five loads after one warm-up).
//   GazetteerBuilder --geonames cities1000.txt --corpora DIR --ner DIR[:DIR...] --out models/gazetteer.bin.gz
// --corpora: lid/<code>.txt sentences (common words); --ner: folders whose *train* IOB2/CoNLL files
// give person names (only training splits are read, so evaluation sets stay unseen); --countries:
// the folder of the npm package i18n-iso-countries (country names in many locales).
//   GazetteerBuilder --measure models/gazetteer.bin.gz [--text lid/pl.txt:lid/en.txt]
// --text: also times Find and Lookup over every line of each file (language = file name).

var options = ParseOptions(args);
if (options is null)
{
    Console.Error.WriteLine("usage: GazetteerBuilder --geonames FILE [--corpora DIR] [--ner DIR[:DIR...]] [--countries DIR] --out FILE | --measure FILE");
    return 2;
}

if (options.TryGetValue("measure", out var measured))
    return Measure(measured) && MeasureFind(measured, options.GetValueOrDefault("text")) ? 0 : 1;

var geonames = options["geonames"];
var output = options["out"];
var corpora = options.TryGetValue("corpora", out var dir) && Directory.Exists(dir)
    ? Directory.GetFiles(dir, "*.txt").Where(f => Path.GetFileName(f) != "SOURCES.md").Order(StringComparer.Ordinal).ToArray()
    : [];
var nerFiles = options.TryGetValue("ner", out var nerDirs)
    ? nerDirs.Split(':').Where(Directory.Exists)
        .SelectMany(d => Directory.EnumerateFiles(d, "*", SearchOption.AllDirectories))
        .Where(f => Path.GetFileName(f).Contains("train", StringComparison.Ordinal) && Path.GetExtension(f) is ".iob2" or ".train")
        .Order(StringComparer.Ordinal).ToArray()
    : [];

var clock = Stopwatch.StartNew();
var (rows, problems) = GeoNamesText.Read(geonames);
foreach (var p in problems.Take(20)) Console.Error.WriteLine(p);
if (rows.IsEmpty)
{
    Console.Error.WriteLine($"no GeoNames rows read from {geonames}");
    return 1;
}
var (altTotal, altKept) = CountAlternates(geonames);
var countries = options.TryGetValue("countries", out var countriesDir) && Directory.Exists(countriesDir)
    ? CountryRows.Build(countriesDir, rows)
    : [];
var gazetteer = Gazetteer.FromRows(rows.Concat(countries), corpora, nerFiles, problems);
gazetteer.Save(output);
Console.WriteLine($"source rows:            {rows.Length}");
Console.WriteLine($"countries added:        {countries.Count} ({countries.Sum(c => c.Names.Length)} names)");
Console.WriteLine($"rows skipped:           {problems.Length}");
Console.WriteLine($"alternate names:        {altTotal} in source, {altKept} kept by script/length/code filter");
Console.WriteLine($"city names kept:        {rows.Sum(r => r.Names.Length)} written forms (main, ASCII and alternate)");
Console.WriteLine($"distinct folded names:  {gazetteer.NameCount}");
foreach (var caution in new[] { NameCaution.CommonWord, NameCaution.CapitalisedWord, NameCaution.PersonName })
    Console.WriteLine($"caution {caution,-15} {gazetteer.Cautions.Count(p => p.Value.HasFlag(caution))} words");
Console.WriteLine($"caution sources:        {corpora.Length} language corpora, {nerFiles.Length} NER training files");
Console.WriteLine($"build time:             {clock.Elapsed.TotalSeconds:F1} s");
return Measure(output) ? 0 : 1;

static bool Measure(string path)
{
    var first = Gazetteer.Load(path);
    if (!first.Problems.IsEmpty)
    {
        foreach (var p in first.Problems) Console.Error.WriteLine(p);
        return false;
    }
    var times = new List<double>();
    var cpu = new List<double>();
    var process = Process.GetCurrentProcess();
    for (int i = 0; i < 5; i++)
    {
        process.Refresh();
        var cpuBefore = process.TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        var g = Gazetteer.Load(path);
        times.Add(clock.Elapsed.TotalMilliseconds);
        process.Refresh();
        cpu.Add((process.TotalProcessorTime - cpuBefore).TotalMilliseconds);
        GC.KeepAlive(g);
    }
    Console.WriteLine($"file:                   {path}");
    Console.WriteLine($"file size:              {new FileInfo(path).Length / 1024.0 / 1024.0:F2} MiB ({new FileInfo(path).Length} bytes)");
    Console.WriteLine($"places:                 {first.Places.Count}");
    Console.WriteLine($"distinct folded names:  {first.NameCount}");
    Console.WriteLine($"load time:              best {times.Min():F0} ms, median {times.Order().ElementAt(2):F0} ms of 5 (after 1 warm-up)");
    Console.WriteLine($"load CPU time:          best {cpu.Min():F0} ms, median {cpu.Order().ElementAt(2):F0} ms (all threads, GC included)");
    if (File.Exists("/proc/loadavg"))
        Console.WriteLine($"machine load average:   {File.ReadAllText("/proc/loadavg").Split(' ')[0]} on {Environment.ProcessorCount} cores");
    return true;
}

static bool MeasureFind(string path, string? textFiles)
{
    if (textFiles is null) return true;
    var g = Gazetteer.Load(path);
    foreach (var file in textFiles.Split(':'))
    {
        var language = new LanguageCode(Path.GetFileNameWithoutExtension(file));
        var lines = File.ReadAllLines(file);
        int matches = 0;
        var clock = Stopwatch.StartNew();
        var spans = new List<string>();
        foreach (var line in lines)
            foreach (var m in g.Find(line, language))
            {
                matches++;
                spans.Add(line[m.CharStart..m.CharEnd]);
            }
        double findSeconds = clock.Elapsed.TotalSeconds;
        long chars = lines.Sum(l => (long)l.Length);
        clock.Restart();
        int found = spans.Count(s => g.Lookup(s, language).Count > 0);
        double lookupSeconds = clock.Elapsed.TotalSeconds;
        Console.WriteLine($"find {language}: {lines.Length} lines, {chars} chars in {findSeconds:F2} s " +
                          $"({chars / findSeconds / 1000:F0} k chars/s), {matches} spans; " +
                          $"{spans.Count} lookups in {lookupSeconds * 1000:F0} ms ({found} with candidates)");
    }
    return true;
}

static (long Total, long Kept) CountAlternates(string path)
{
    long total = 0, kept = 0;
    foreach (var line in File.ReadLines(path))
    {
        var columns = line.Split('\t');
        if (columns.Length < 4) continue;
        foreach (var alt in columns[3].Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            total++;
            if (ScriptFilter.Keep(alt)) kept++;
        }
    }
    return (total, kept);
}

static Dictionary<string, string>? ParseOptions(string[] args)
{
    var options = new Dictionary<string, string>();
    for (int i = 0; i + 1 < args.Length; i += 2)
    {
        if (!args[i].StartsWith("--", StringComparison.Ordinal)) return null;
        options[args[i][2..]] = args[i + 1];
    }
    if (args.Length % 2 != 0) return null;
    bool build = options.ContainsKey("geonames") && options.ContainsKey("out");
    return build || options.ContainsKey("measure") ? options : null;
}
