namespace Winding.Web.Planning;

/// <summary>Where the plan page's core comes from.</summary>
public enum CoreSource
{
    /// <summary>A core picked from the catalogue (<c>core.catalogueId</c>).</summary>
    Catalogue,

    /// <summary>A core typed on the plan page, e.g. a salvaged one measured with a caliper (inline core).</summary>
    Typed,
}
