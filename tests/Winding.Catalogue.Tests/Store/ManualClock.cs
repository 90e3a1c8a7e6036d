namespace Winding.Catalogue.Tests.Store;

/// <summary>A clock the test sets by hand.</summary>
internal sealed class ManualClock(DateTimeOffset start) : TimeProvider
{
    public DateTimeOffset Now { get; set; } = start;

    public override DateTimeOffset GetUtcNow() => Now;

    public void Advance(TimeSpan step) => Now += step;
}
