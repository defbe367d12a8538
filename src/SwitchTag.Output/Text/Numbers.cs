using System.Globalization;

namespace SwitchTag.Output.Text;

public static class Numbers
{
    public static string Confidence(double value) => value.ToString("0.####", CultureInfo.InvariantCulture);

    public static string Integer(long value) => value.ToString(CultureInfo.InvariantCulture);

    public static string Coordinate(double value) => value.ToString("0.#####", CultureInfo.InvariantCulture);
}
