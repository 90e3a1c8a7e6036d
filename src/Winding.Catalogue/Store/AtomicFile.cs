using System.Text;

namespace Winding.Catalogue.Store;

/// <summary>
/// Writes a file so that a reader (or a restart after a crash) sees either the old or the new content, never a part:
/// the text goes to a temporary file in the same folder, is flushed to the disk, and is then renamed over the target
/// (an atomic replace on one file system). Temporary files end in <see cref="TemporarySuffix"/>, start with a dot, and
/// are never read as entries.
/// </summary>
internal static class AtomicFile
{
    /// <summary>Name ending of temporary files.</summary>
    public const string TemporarySuffix = ".tmp";

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>Replaces <paramref name="path"/> with <paramref name="text"/> (UTF-8, no byte-order mark), creating its folder.</summary>
    public static void Write(string path, string text)
    {
        var directory = Path.GetDirectoryName(path)!;
        Directory.CreateDirectory(directory);
        var temporary = Path.Combine(directory, "." + Path.GetFileName(path) + "." + Guid.NewGuid().ToString("N") + TemporarySuffix);
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(Utf8.GetBytes(text));
                stream.Flush(flushToDisk: true);
            }

            File.Move(temporary, path, overwrite: true);
        }
        catch
        {
            TryDelete(temporary);
            throw;
        }
    }

    /// <summary>Deletes temporary files left below <paramref name="directory"/> by an interrupted write.</summary>
    public static void DeleteLeftovers(string directory)
    {
        if (!Directory.Exists(directory))
        {
            return;
        }

        foreach (var file in Directory.EnumerateFiles(directory, "*" + TemporarySuffix, SearchOption.AllDirectories))
        {
            TryDelete(file);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Left for the next clean-up; temporary files are never read as entries.
        }
    }
}
