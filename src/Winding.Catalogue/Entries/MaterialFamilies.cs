namespace Winding.Catalogue.Entries;

/// <summary>The material family words used in files and the API.</summary>
public static class MaterialFamilies
{
    /// <summary>Nickel-zinc ferrite.</summary>
    public const string NickelZinc = "NiZn";

    /// <summary>Manganese-zinc ferrite.</summary>
    public const string ManganeseZinc = "MnZn";

    /// <summary>Pressed iron powder with an insulating binder.</summary>
    public const string IronPowder = "iron powder";

    /// <summary>All family words.</summary>
    public static IReadOnlyList<string> All { get; } = [NickelZinc, ManganeseZinc, IronPowder];
}
