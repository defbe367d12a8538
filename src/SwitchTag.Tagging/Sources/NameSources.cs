using System.Collections;

namespace SwitchTag.Tagging.Sources;

/// <summary>The registry of name sources a tagger asks, one per <see cref="INameSource.Source"/>.
/// Registration order does not decide overlaps; <see cref="NamePrecedence"/> does.</summary>
public sealed class NameSources : IReadOnlyList<INameSource>
{
    private readonly List<INameSource> _sources = [];

    public NameSources Add(INameSource source)
    {
        if (_sources.Any(s => s.Source == source.Source)) throw new ArgumentException($"a name source {source.Source} is already registered");
        _sources.Add(source);
        return this;
    }

    public INameSource this[int index] => _sources[index];
    public int Count => _sources.Count;
    public IEnumerator<INameSource> GetEnumerator() => _sources.GetEnumerator();
    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
