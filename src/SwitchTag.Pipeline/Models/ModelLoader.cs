using System.Text.Json;
using Microsoft.ML.OnnxRuntime;

namespace SwitchTag.Pipeline.Models;

/// <summary>Why a model could not be loaded, worded the same for every model and command.</summary>
public sealed record ModelLoadError(string Path, string Model, string Reason, string Rebuild)
{
    public override string ToString() => $"cannot load the {Model} {Path}: {Reason} (rebuild it with {Rebuild})";
}

/// <summary>The one path by which a model file becomes an object or a <see cref="ModelLoadError"/>:
/// a missing file and every failure a damaged or foreign file can cause are caught here, so no
/// caller repeats the list.</summary>
public static class ModelLoader
{
    public static T? Load<T>(string path, string model, string rebuild, Func<T> load, out ModelLoadError? error) where T : class
    {
        error = null;
        if (!File.Exists(path))
        {
            error = new ModelLoadError(path, model, "the file is missing", rebuild);
            return null;
        }
        try
        {
            return load();
        }
        catch (Exception e) when (e is IOException or InvalidDataException or UnauthorizedAccessException or OnnxRuntimeException
                                      or KeyNotFoundException or JsonException or FormatException or ArgumentException)
        {
            error = new ModelLoadError(path, model, e.Message, rebuild);
            return null;
        }
    }
}
