using System.Globalization;
using System.Numerics;

namespace Winding.Catalogue.Touchstone;

/// <summary>
/// A one-port Touchstone version 1 file (<c>.s1p</c>), read into the port impedance at each frequency.
/// <para>
/// Format (Touchstone File Format Specification, version 1.1, EIA/IBIS Open Forum 2002, from memory): <c>!</c> starts a
/// comment anywhere on a line; one option line <c># [Hz|kHz|MHz|GHz] [S|Y|Z] [MA|DB|RI] [R n]</c>, items in any order
/// and any case, each missing item defaulting to GHz S MA R 50; then one data line per frequency,
/// <c>frequency value1 value2</c>, frequencies increasing. MA is magnitude and angle in degrees, DB is 20·log10 of the
/// magnitude and angle in degrees, RI is real and imaginary part. A file without an option line uses the defaults.
/// </para>
/// <para>
/// Conversion to the impedance, with R the reference resistance: S holds Γ, so Z = R·(1 + Γ)/(1 − Γ); in version 1
/// files Y and Z are normalised to R (the specification's example "# MHz Z MA R 75" with 0.99 ∠ −4° is
/// 74.25 Ω ∠ −4°, from memory), so Z = R·z and Z = R/y. Version 2 keywords (<c>[Version]</c> …), H and G parameters
/// (two-port only) and multi-port data are refused.
/// </para>
/// </summary>
public sealed record TouchstoneFile
{
    /// <summary>The largest file accepted: 2 MiB of text.</summary>
    public const int MaximumCharacters = 2 * 1024 * 1024;

    /// <summary>The largest number of frequency points accepted.</summary>
    public const int MaximumPoints = 100_000;

    private TouchstoneFile(TouchstoneOptions options, bool hasOptionLine, IReadOnlyList<TouchstonePoint> points)
    {
        Options = options;
        HasOptionLine = hasOptionLine;
        Points = points;
    }

    /// <summary>The options in force (the defaults where the option line said nothing, or when there was none).</summary>
    public TouchstoneOptions Options { get; }

    /// <summary>True when the file had an option line.</summary>
    public bool HasOptionLine { get; }

    /// <summary>The frequency points in file order (strictly increasing frequency).</summary>
    public IReadOnlyList<TouchstonePoint> Points { get; }

    /// <summary>The points as (frequency Hz, Z Ω) pairs, the shape the characterisation code takes.</summary>
    public IReadOnlyList<(double FrequencyHz, Complex ImpedanceOhm)> Impedances() =>
        Points.Select(p => (p.FrequencyHz, p.ImpedanceOhm)).ToArray();

    /// <summary>Reads a one-port Touchstone version 1 file; never throws for bad content.</summary>
    /// <param name="text">The whole file.</param>
    /// <returns>The file, or the first error with its 1-based line number and the reason.</returns>
    public static TouchstoneReadResult Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length > MaximumCharacters)
        {
            return Fail(null, FormattableString.Invariant(
                $"The file is {text.Length / 1024.0 / 1024.0:0.0} MB; at most 2 MB is accepted. Export fewer frequency points."));
        }

        var options = TouchstoneOptions.Default;
        var hasOptionLine = false;
        var points = new List<TouchstonePoint>();
        var lines = text.ReplaceLineEndings("\n").Split('\n');
        for (var index = 0; index < lines.Length; index++)
        {
            var lineNumber = index + 1;
            var line = StripComment(lines[index]).Trim();
            if (line.Length == 0)
            {
                continue;
            }

            if (line[0] == '#')
            {
                if (hasOptionLine)
                {
                    return Fail(lineNumber, "A second option line ('#'); a file may have only one.");
                }

                if (points.Count > 0)
                {
                    return Fail(lineNumber, "The option line ('#') comes after data; it must come before the first data line.");
                }

                var parsed = ParseOptionLine(line[1..], lineNumber);
                if (parsed.Error is not null)
                {
                    return new TouchstoneReadResult(null, parsed.Error);
                }

                options = parsed.Options!;
                hasOptionLine = true;
                continue;
            }

            if (line[0] == '[')
            {
                return Fail(lineNumber, "Touchstone version 2 keywords ('[…]') are not supported; save the sweep as a version 1 .s1p file.");
            }

            if (points.Count == MaximumPoints)
            {
                return Fail(lineNumber, FormattableString.Invariant($"More than {MaximumPoints} frequency points; export fewer points."));
            }

            var point = ParseDataLine(line, lineNumber, options, points.Count > 0 ? points[^1].FrequencyHz : null);
            if (point.Error is not null)
            {
                return new TouchstoneReadResult(null, point.Error);
            }

            points.Add(point.Point);
        }

        return points.Count == 0
            ? Fail(null, "The file holds no data lines (only comments, blank lines or an option line).")
            : new TouchstoneReadResult(new TouchstoneFile(options, hasOptionLine, points), null);
    }

    private static string StripComment(string line)
    {
        var bang = line.IndexOf('!', StringComparison.Ordinal);
        return bang < 0 ? line : line[..bang];
    }

    private static string[] Tokens(string text) =>
        text.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries);

    private static (TouchstoneOptions? Options, TouchstoneError? Error) ParseOptionLine(string body, int lineNumber)
    {
        TouchstoneFrequencyUnit? unit = null;
        TouchstoneParameter? parameter = null;
        TouchstoneDataFormat? format = null;
        double? resistance = null;
        var tokens = Tokens(body);
        for (var i = 0; i < tokens.Length; i++)
        {
            var token = tokens[i].ToUpperInvariant();
            string? duplicate = null;
            switch (token)
            {
                case "HZ" or "KHZ" or "MHZ" or "GHZ":
                    duplicate = unit is null ? null : "frequency unit";
                    unit = token switch { "HZ" => TouchstoneFrequencyUnit.Hz, "KHZ" => TouchstoneFrequencyUnit.KHz, "MHZ" => TouchstoneFrequencyUnit.MHz, _ => TouchstoneFrequencyUnit.GHz };
                    break;
                case "S" or "Y" or "Z":
                    duplicate = parameter is null ? null : "parameter";
                    parameter = token switch { "S" => TouchstoneParameter.Scattering, "Y" => TouchstoneParameter.Admittance, _ => TouchstoneParameter.Impedance };
                    break;
                case "H" or "G":
                    return (null, new TouchstoneError(lineNumber, FormattableString.Invariant($"{token} parameters describe two-ports; a one-port file holds S, Y or Z.")));
                case "MA" or "DB" or "RI":
                    duplicate = format is null ? null : "data format";
                    format = token switch { "MA" => TouchstoneDataFormat.MagnitudeAngle, "DB" => TouchstoneDataFormat.DecibelAngle, _ => TouchstoneDataFormat.RealImaginary };
                    break;
                case "R":
                    if (resistance is not null)
                    {
                        duplicate = "reference resistance";
                        break;
                    }

                    if (i + 1 >= tokens.Length || !TryParseNumber(tokens[i + 1], out var r) || r <= 0)
                    {
                        return (null, new TouchstoneError(lineNumber, "'R' must be followed by the reference resistance in ohms, a number above 0."));
                    }

                    resistance = r;
                    i++;
                    break;
                default:
                    return (null, new TouchstoneError(lineNumber, FormattableString.Invariant(
                        $"'{tokens[i]}' is not an option; expected a unit (Hz, kHz, MHz, GHz), a parameter (S, Y, Z), a format (MA, DB, RI) or 'R' and a resistance.")));
            }

            if (duplicate is not null)
            {
                return (null, new TouchstoneError(lineNumber, FormattableString.Invariant($"The option line gives the {duplicate} twice.")));
            }
        }

        var defaults = TouchstoneOptions.Default;
        return (new TouchstoneOptions(
            unit ?? defaults.FrequencyUnit, parameter ?? defaults.Parameter, format ?? defaults.Format, resistance ?? defaults.ReferenceResistanceOhm), null);
    }

    private static (TouchstonePoint Point, TouchstoneError? Error) ParseDataLine(string line, int lineNumber, TouchstoneOptions options, double? previousHz)
    {
        var tokens = Tokens(line);
        if (tokens.Length != 3)
        {
            var hint = tokens.Length == 9 ? " This looks like a two-port (.s2p) line." : string.Empty;
            return Error(lineNumber, FormattableString.Invariant(
                $"Expected 3 numbers (frequency and one complex value in two columns) for a one-port file, found {tokens.Length}.{hint}"));
        }

        var values = new double[3];
        for (var i = 0; i < 3; i++)
        {
            if (!TryParseNumber(tokens[i], out values[i]))
            {
                return Error(lineNumber, FormattableString.Invariant($"'{tokens[i]}' is not a number."));
            }
        }

        var frequencyHz = values[0] * options.HertzPerUnit;
        if (frequencyHz < 0 || !double.IsFinite(frequencyHz))
        {
            return Error(lineNumber, "The frequency must be a finite number of at least 0.");
        }

        if (previousHz is { } previous && frequencyHz <= previous)
        {
            return Error(lineNumber, FormattableString.Invariant(
                $"Frequencies must increase: {values[0]} {options.FrequencyUnit} does not come after the previous line's."));
        }

        Complex value;
        switch (options.Format)
        {
            case TouchstoneDataFormat.RealImaginary:
                value = new Complex(values[1], values[2]);
                break;
            case TouchstoneDataFormat.MagnitudeAngle when values[1] < 0:
                return Error(lineNumber, "A magnitude must not be negative.");
            default:
                var magnitude = options.Format == TouchstoneDataFormat.DecibelAngle ? Math.Pow(10, values[1] / 20) : values[1];
                value = Polar(magnitude, values[2]);
                break;
        }

        var (impedance, reason) = ToImpedance(value, options);
        return reason is not null ? Error(lineNumber, reason) : (new TouchstonePoint(frequencyHz, impedance, lineNumber), null);
    }

    private static Complex Polar(double magnitude, double angleDegrees)
    {
        // Exact at multiples of 90°, so that 1 ∠ 0° and 1 ∠ 360° are both the open circuit Γ = 1 exactly.
        var reduced = angleDegrees % 360;
        if (reduced % 90 == 0)
        {
            var quarter = ((int)(reduced / 90) % 4 + 4) % 4;
            return quarter switch { 0 => new(magnitude, 0), 1 => new(0, magnitude), 2 => new(-magnitude, 0), _ => new(0, -magnitude) };
        }

        return Complex.FromPolarCoordinates(magnitude, reduced * Math.PI / 180);
    }

    private static (Complex Impedance, string? Reason) ToImpedance(Complex value, TouchstoneOptions options)
    {
        var r = options.ReferenceResistanceOhm;
        Complex z;
        switch (options.Parameter)
        {
            case TouchstoneParameter.Scattering:
                if (value == Complex.One)
                {
                    return (Complex.Zero, "Γ = 1 is an open circuit: the impedance is infinite.");
                }

                z = r * (1 + value) / (1 - value);
                break;
            case TouchstoneParameter.Admittance:
                if (value == Complex.Zero)
                {
                    return (Complex.Zero, "Y = 0 is an open circuit: the impedance is infinite.");
                }

                z = r / value;
                break;
            default:
                z = r * value;
                break;
        }

        return double.IsFinite(z.Real) && double.IsFinite(z.Imaginary)
            ? (z, null)
            : (Complex.Zero, "The value gives an infinite impedance (an open circuit, or a number too large).");
    }

    private static bool TryParseNumber(string token, out double value) =>
        double.TryParse(token, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);

    private static TouchstoneReadResult Fail(int? lineNumber, string reason) => new(null, new TouchstoneError(lineNumber, reason));

    private static (TouchstonePoint Point, TouchstoneError? Error) Error(int lineNumber, string reason) =>
        (default, new TouchstoneError(lineNumber, reason));
}
