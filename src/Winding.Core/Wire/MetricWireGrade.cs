namespace Winding.Core.Wire;

/// <summary>
/// Insulation grade of enamelled round wire per IEC 60317-0-1: grade 1 has the thinnest enamel, grade 3 the thickest.
/// </summary>
public enum MetricWireGrade
{
    /// <summary>Grade 1, the thinnest enamel.</summary>
    Grade1 = 1,

    /// <summary>Grade 2.</summary>
    Grade2 = 2,

    /// <summary>Grade 3, the thickest enamel.</summary>
    Grade3 = 3,
}
