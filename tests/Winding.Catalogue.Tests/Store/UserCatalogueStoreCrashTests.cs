using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using Winding.Catalogue.Store;

namespace Winding.Catalogue.Tests.Store;

/// <summary>
/// Crash safety of the store's writes: a child process (tests/Winding.Catalogue.CrashWriter) saves entries in a tight
/// loop and is killed at a random moment, again and again on the same data folder. After every kill the folder must load
/// without a problem, every file must parse, and each entry must be at (or, when the kill fell between the rename and
/// the report, one past) the last version the child reported as committed, with content that matches its version.
/// </summary>
public sealed partial class UserCatalogueStoreCrashTests : IDisposable
{
    private const int Rounds = 30;

    private readonly StoreFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void KilledWriter_NeverLeavesAHalfWrittenOrLostEntry()
    {
        var writer = Path.Combine(AppContext.BaseDirectory, "crash-writer", "Winding.Catalogue.CrashWriter.dll");
        Assert.True(File.Exists(writer), $"The crash writer was not built next to the tests: {writer}");
        var emptyBuiltIn = Path.Combine(_folder.Root, "empty-builtin");
        Directory.CreateDirectory(emptyBuiltIn);
        var random = new Random(20250301);
        var committed = new Dictionary<string, int>(StringComparer.Ordinal);

        for (var round = 0; round < Rounds; round++)
        {
            var lines = RunAndKill(writer, _folder.Data, emptyBuiltIn, TimeSpan.FromMilliseconds(random.Next(5, 120)));
            Assert.DoesNotContain(lines, l => l.StartsWith("FAIL", StringComparison.Ordinal));
            foreach (var line in lines)
            {
                if (CommitLine().Match(line) is { Success: true } m)
                {
                    committed[m.Groups["id"].Value] = int.Parse(m.Groups["version"].Value, CultureInfo.InvariantCulture);
                }
            }

            var catalogue = new UserCatalogueStore(_folder.Data, emptyBuiltIn, TimeProvider.System).Load();

            Assert.Empty(catalogue.Problems);
            Assert.Empty(Directory.EnumerateFiles(_folder.Catalogue, "*.tmp", SearchOption.AllDirectories));
            foreach (var file in Directory.EnumerateFiles(_folder.Catalogue, "*.json", SearchOption.AllDirectories))
            {
                using var json = JsonDocument.Parse(File.ReadAllText(file));
                var version = json.RootElement.GetProperty("version").GetInt32();
                Assert.EndsWith($" v{version}", json.RootElement.GetProperty("name").GetString(), StringComparison.Ordinal);
                if (file.Contains($"{Path.DirectorySeparatorChar}history{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
                {
                    Assert.Equal(Path.GetFileNameWithoutExtension(file), version.ToString(CultureInfo.InvariantCulture));
                }
            }

            var versions = catalogue.Cores.Select(c => (c.Id, c.Version)).Concat(catalogue.Materials.Select(m => (m.Id, m.Version)));
            foreach (var (id, version) in versions)
            {
                var last = committed.GetValueOrDefault(id, 1);
                Assert.True(version == last || version == last + 1, $"Round {round}: {id} is at version {version}, the last committed was {last}.");
                committed[id] = version;
            }

            Assert.Equal(4, committed.Count);
        }

        Assert.True(committed.Values.Sum() > 4 * 2, "the writer saved new versions between kills");
    }

    private static List<string> RunAndKill(string writer, string data, string builtIn, TimeSpan delay)
    {
        var start = new ProcessStartInfo(DotnetHost())
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(writer);
        start.ArgumentList.Add(data);
        start.ArgumentList.Add(builtIn);
        var lines = new ConcurrentQueue<string>();
        using var ready = new ManualResetEventSlim();
        using var process = new Process { StartInfo = start };
        process.OutputDataReceived += (_, e) =>
        {
            if (e.Data is { } line)
            {
                lines.Enqueue(line);
                if (line == "ready")
                {
                    ready.Set();
                }
            }
        };
        process.Start();
        process.BeginOutputReadLine();
        var started = ready.Wait(TimeSpan.FromSeconds(20));
        if (started)
        {
            Thread.Sleep(delay);
        }

        process.Kill(entireProcessTree: true);
        process.WaitForExit();
        Assert.True(started, "The crash writer did not start: " + process.StandardError.ReadToEnd());
        return [.. lines];
    }

    /// <summary>The dotnet host that runs the tests (the SDK sets DOTNET_HOST_PATH), else dotnet from the PATH.</summary>
    private static string DotnetHost()
    {
        var host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        if (!string.IsNullOrEmpty(host) && File.Exists(host))
        {
            return host;
        }

        var current = Environment.ProcessPath;
        return current is not null && Path.GetFileNameWithoutExtension(current) == "dotnet" ? current : "dotnet";
    }

    [GeneratedRegex(@"^(core|material) (?<id>[a-z0-9-]+) (?<version>\d+)$", RegexOptions.CultureInvariant)]
    private static partial Regex CommitLine();
}
