using System.Runtime.InteropServices;

namespace SwitchTag.Formats.Files;

/// <summary>What a path names once symbolic links are followed.</summary>
public enum FileKind { Missing, RegularFile, Directory, NamedPipe, CharacterDevice, BlockDevice, Socket, Other }

/// <summary>The kind of a file, from stat(2). .NET has no public API for it (FileAttributes says nothing
/// of FIFOs, devices or sockets), and opening a FIFO to find out blocks until a writer appears, so the
/// runtime's own portable stat shim is called: its FileStatus record starts with Flags and Mode on every
/// Unix the runtime supports. Where the shim is absent (Windows), attributes decide and every file is
/// regular.</summary>
public static class FileKinds
{
    public static FileKind Of(string path)
    {
        try
        {
            if (Native.Stat(path, out var status) != 0) return FileKind.Missing;
            return (status.Mode & 0xF000) switch
            {
                0x8000 => FileKind.RegularFile,
                0x4000 => FileKind.Directory,
                0x1000 => FileKind.NamedPipe,
                0x2000 => FileKind.CharacterDevice,
                0x6000 => FileKind.BlockDevice,
                0xC000 => FileKind.Socket,
                _ => FileKind.Other,
            };
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
        {
            return Directory.Exists(path) ? FileKind.Directory : File.Exists(path) ? FileKind.RegularFile : FileKind.Missing;
        }
    }

    /// <summary>How a kind is named in a message.</summary>
    public static string Describe(this FileKind kind) => kind switch
    {
        FileKind.Missing => "missing",
        FileKind.RegularFile => "a regular file",
        FileKind.Directory => "a folder",
        FileKind.NamedPipe => "a named pipe (FIFO)",
        FileKind.CharacterDevice => "a character device",
        FileKind.BlockDevice => "a block device",
        FileKind.Socket => "a socket",
        _ => "a special file",
    };

    private static class Native
    {
        /// <summary>The shim's FileStatus (pal_io.h): Flags, Mode, Uid, Gid, Size, then times and ids;
        /// only Mode is read, and the record is sized generously so a later field can never overrun.</summary>
        [StructLayout(LayoutKind.Sequential, Size = 256)]
        public struct FileStatus
        {
            public int Flags;
            public int Mode;
        }

        [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", SetLastError = true)]
        public static extern int Stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, out FileStatus status);
    }
}
