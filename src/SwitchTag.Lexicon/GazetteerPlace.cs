namespace SwitchTag.Lexicon;

/// <summary>A populated place of the GeoNames gazetteer. <paramref name="Country"/> is the ISO 3166-1
/// alpha-2 code; <paramref name="FeatureCode"/> the GeoNames feature code (PPL, PPLA, PPLC...).</summary>
public sealed record GazetteerPlace(long GeonameId, string Name, double Latitude, double Longitude, string Country, long Population, string FeatureCode);

/// <summary>A place found for a name, and how the name met one of the place's names.</summary>
public sealed record GazetteerCandidate(GazetteerPlace Place, MatchKind Kind);
