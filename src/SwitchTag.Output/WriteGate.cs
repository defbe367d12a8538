namespace SwitchTag.Output;

/// <summary>Lets a signal end the process between writes, never in the middle of one. Every step that
/// changes the output folder (a file written and renamed by <see cref="AtomicFile"/>, a store
/// transaction, a folder swapped in) runs inside <see cref="Step"/>; <see cref="Stop"/> waits for the
/// steps in progress to finish, after which every step throws <see cref="OperationCanceledException"/>
/// before it touches the disk. A stopped run therefore leaves only whole files, and nothing that a
/// step could still add to once the caller has cleaned up. Process-wide, as signals are.</summary>
public static class WriteGate
{
    // Steps share the lock (many workers write at once); Stop takes it alone. Recursion: a collection
    // write is one step per file inside the caller's step.
    private static readonly ReaderWriterLockSlim Lock = new(LockRecursionPolicy.SupportsRecursion);
    private static volatile bool _stopped;

    public static bool Stopped => _stopped;

    public static void Step(Action step) => Step(() => { step(); return 0; });

    public static T Step<T>(Func<T> step)
    {
        Lock.EnterReadLock();
        try
        {
            if (_stopped) throw new OperationCanceledException("the run is stopping (a signal came)");
            return step();
        }
        finally
        {
            Lock.ExitReadLock();
        }
    }

    /// <summary>Waits for every step in progress, then refuses every later one.</summary>
    public static void Stop()
    {
        Lock.EnterWriteLock();
        _stopped = true;
        Lock.ExitWriteLock();
    }
}
