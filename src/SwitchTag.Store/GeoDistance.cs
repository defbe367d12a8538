namespace SwitchTag.Store;

/// <summary>Great-circle distance on a sphere (haversine formula).</summary>
public static class GeoDistance
{
    /// <summary>Mean Earth radius in km (IUGG value, from memory).</summary>
    public const double EarthRadiusKm = 6371.0088;

    public static double Kilometres(double lat1, double lon1, double lat2, double lon2)
    {
        double dLat = Radians(lat2 - lat1), dLon = Radians(lon2 - lon1);
        double a = Math.Pow(Math.Sin(dLat / 2), 2) + Math.Cos(Radians(lat1)) * Math.Cos(Radians(lat2)) * Math.Pow(Math.Sin(dLon / 2), 2);
        return 2 * EarthRadiusKm * Math.Asin(Math.Min(1.0, Math.Sqrt(a)));
    }

    private static double Radians(double degrees) => degrees * Math.PI / 180.0;
}
