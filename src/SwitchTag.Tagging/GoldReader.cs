namespace SwitchTag.Tagging;

/// <summary>Reads pre-tokenised NER gold files as DESIGN.md's <c>eval ner</c> contract defines them:
/// tab-separated columns, '#' comment lines, a blank line between sentences, -DOCSTART- lines
/// ignored; when the first column is a number the layout is index, token, tag (Universal NER),
/// otherwise token first and tag last (CoNLL). A CoNLL-U Plus file whose '# global.columns' header
/// names FORM and CONLL:NER (NerKor) is read by those columns. Tags other than PER/LOC/ORG become
/// O; I- tags are kept as written so scoring applies conlleval's chunk rules.</summary>
public static class GoldReader
{
    public static List<GoldSentence> Read(string path, List<string> problems)
    {
        var sentences = new List<GoldSentence>();
        var words = new List<string>();
        var tags = new List<string>();
        int first = 0, lineNo = 0;
        int formCol = -1, nerCol = -1;

        void Flush()
        {
            if (words.Count > 0) sentences.Add(new GoldSentence([.. words], [.. tags], first));
            words.Clear();
            tags.Clear();
        }

        foreach (var raw in File.ReadLines(path))
        {
            lineNo++;
            var line = raw.TrimEnd('\r');
            if (line.StartsWith("# global.columns", StringComparison.Ordinal))
            {
                var names = line[(line.IndexOf('=') + 1)..].Split(' ', StringSplitOptions.RemoveEmptyEntries);
                formCol = Array.IndexOf(names, "FORM");
                nerCol = Array.IndexOf(names, "CONLL:NER");
                continue;
            }
            if (line.StartsWith("#DOCSTART", StringComparison.Ordinal) || line.StartsWith("-DOCSTART-", StringComparison.Ordinal)) continue;
            if (line.StartsWith('#')) continue;
            if (line.Trim().Length == 0) { Flush(); continue; }
            var cols = line.Split('\t');
            string word, tag;
            if (formCol >= 0 && nerCol >= 0 && cols.Length > Math.Max(formCol, nerCol))
            {
                (word, tag) = (cols[formCol], cols[nerCol]);
            }
            else if (cols.Length >= 3 && cols[0].Length > 0 && cols[0].All(char.IsAsciiDigit))
            {
                (word, tag) = (cols[1], cols[2]);
            }
            else if (cols[0].Length > 0 && (cols[0].Contains('-') || cols[0].Contains('.')) && cols[0].All(c => char.IsAsciiDigit(c) || c is '-' or '.') && cols.Length >= 3)
            {
                continue; // a CoNLL-U multiword or empty-node line: its words follow on their own lines
            }
            else if (cols.Length >= 2)
            {
                (word, tag) = (cols[0], cols[^1]);
            }
            else
            {
                problems.Add($"{path}:{lineNo}: expected tab-separated token and tag");
                continue;
            }
            if (words.Count == 0) first = lineNo;
            words.Add(word);
            tags.Add(Normalise(tag.Trim()));
        }
        Flush();
        return sentences;
    }

    private static string Normalise(string tag)
    {
        if (tag.Length < 3 || tag[1] != '-' || tag[0] is not ('B' or 'I')) return "O";
        var type = tag[2..];
        return type is "PER" or "LOC" or "ORG" ? tag : "O";
    }
}
