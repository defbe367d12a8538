using System.Diagnostics;

namespace LangIdTools;

/// <summary>Times a pass both by wall clock and by this process's CPU time. The machine is shared,
/// so CPU seconds (per core) are the fairer measure; both are printed.</summary>
public static class Throughput
{
    public readonly record struct Rate(double WallMBps, double CpuMBps, double WallMs);

    public static Rate Measure(long bytes, int passes, Action pass)
    {
        pass();
        var process = Process.GetCurrentProcess();
        process.Refresh();
        var cpu0 = process.TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        for (int i = 0; i < passes; i++) pass();
        double wall = clock.Elapsed.TotalSeconds / passes;
        process.Refresh();
        double cpu = (process.TotalProcessorTime - cpu0).TotalSeconds / passes;
        double mb = bytes / 1048576.0;
        return new Rate(mb / wall, mb / Math.Max(cpu, 1e-9), wall * 1000);
    }
}
