using System.Globalization;
using System.Text.RegularExpressions;

/// <summary>Synthetic interviews: the demo set repeated, each copy with its narrators' names changed
/// to invented ones and every timestamp shifted, so no two copies have the same bytes.</summary>
internal static partial class Synthetic
{
    private static readonly string[] Surnames = ["Kowalczyk", "Ferreira", "Lindner", "Esposito"];
    private static readonly string[] GivenNames = ["Irena", "Manuel", "Walter", "Carmela"];
    private static readonly string[] Starts = ["Bar", "Dor", "Fel", "Gor", "Hal", "Jes", "Kar", "Lom", "Mar", "Nor"];
    private static readonly string[] Ends = ["ski", "wicz", "ani", "ez", "berg", "mann", "ova", "elli", "ado", "sen"];
    private static readonly string[] Given = ["Ada", "Bruno", "Celia", "Dario", "Edda", "Felix", "Greta", "Hugo", "Ines", "Jonas", "Klara", "Leon"];

    [GeneratedRegex(@"(\d{2}):(\d{2}):(\d{2})(?=[.,]\d{3}|\])")]
    private static partial Regex Timestamp();

    public static List<string> Write(string demo, string into, int count)
    {
        Directory.CreateDirectory(into);
        var sources = Directory.GetFiles(demo).Where(f => Path.GetFileName(f) != "README.md").Order(StringComparer.Ordinal).ToArray();
        var written = new List<string>();
        for (int k = 0; written.Count < count; k++)
            foreach (var source in sources)
            {
                if (written.Count == count) break;
                string text = File.ReadAllText(source);
                for (int s = 0; s < Surnames.Length; s++)
                    text = text.Replace(Surnames[s], Starts[(k + s) % Starts.Length] + Ends[(k / Starts.Length + s) % Ends.Length], StringComparison.Ordinal);
                for (int g = 0; g < GivenNames.Length; g++)
                    text = text.Replace(GivenNames[g], Given[(k + 3 * g) % Given.Length], StringComparison.Ordinal);
                int shift = k % 50;
                text = Timestamp().Replace(text, m =>
                {
                    int seconds = int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) * 3600 + int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture) * 60
                                  + int.Parse(m.Groups[3].Value, CultureInfo.InvariantCulture) + shift;
                    return string.Create(CultureInfo.InvariantCulture, $"{seconds / 3600:00}:{seconds / 60 % 60:00}:{seconds % 60:00}");
                });
                string path = Path.Combine(into, $"{Path.GetFileNameWithoutExtension(source)}-{k:0000}{Path.GetExtension(source)}");
                File.WriteAllText(path, text);
                written.Add(path);
            }
        return written;
    }
}
