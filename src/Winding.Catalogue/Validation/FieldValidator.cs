using System.Globalization;

namespace Winding.Catalogue.Validation;

/// <summary>
/// Collects field errors while a document is checked. Each check names the field, the allowed range and the unit, and
/// refuses missing values, NaN and infinity.
/// </summary>
public sealed class FieldValidator
{
    private readonly List<FieldError> _errors = [];

    /// <summary>The errors collected so far.</summary>
    public IReadOnlyList<FieldError> Errors => _errors;

    /// <summary>True when no error was collected.</summary>
    public bool IsValid => _errors.Count == 0;

    /// <summary>Adds an error.</summary>
    public void Add(string field, string message) => _errors.Add(new FieldError(field, message));

    /// <summary>Checks that a required number is present, finite and within [min, max]; returns it or null.</summary>
    public double? Range(string field, double? value, double min, double max, string unit, bool minimumExclusive = false)
    {
        if (value is null)
        {
            Add(field, $"Required: enter a number {Describe(min, max, unit, minimumExclusive)}.");
            return null;
        }

        return Range(field, value.Value, min, max, unit, minimumExclusive);
    }

    /// <summary>Checks that a number is finite and within [min, max] (or (min, max]); returns it or null.</summary>
    public double? Range(string field, double value, double min, double max, string unit, bool minimumExclusive = false)
    {
        var belowMinimum = minimumExclusive ? value <= min : value < min;
        if (!double.IsFinite(value) || belowMinimum || value > max)
        {
            Add(field, $"{Show(value)} is out of range: enter a number {Describe(min, max, unit, minimumExclusive)}.");
            return null;
        }

        return value;
    }

    /// <summary>Checks that a required whole number is present and within [min, max]; returns it or null.</summary>
    public int? WholeRange(string field, int? value, int min, int max, string what)
    {
        if (value is null)
        {
            Add(field, $"Required: enter a whole number of {what} from {min} to {max.ToString("N0", CultureInfo.InvariantCulture)}.");
            return null;
        }

        if (value < min || value > max)
        {
            Add(field, $"{value.Value.ToString(CultureInfo.InvariantCulture)} is out of range: enter a whole number of {what} from {min} to {max.ToString("N0", CultureInfo.InvariantCulture)}.");
            return null;
        }

        return value;
    }

    private static string Describe(double min, double max, string unit, bool minimumExclusive) =>
        minimumExclusive
            ? $"above {Show(min)} and up to {Show(max)}{Unit(unit)}"
            : $"from {Show(min)} to {Show(max)}{Unit(unit)}";

    private static string Unit(string unit) => string.IsNullOrEmpty(unit) ? string.Empty : " " + unit;

    private static string Show(double value) =>
        double.IsNaN(value) ? "NaN" : double.IsInfinity(value) ? "Infinity" : value.ToString("G6", CultureInfo.InvariantCulture);
}
