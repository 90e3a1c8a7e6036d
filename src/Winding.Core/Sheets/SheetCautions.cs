using Winding.Core.Plans;

namespace Winding.Core.Sheets;

/// <summary>
/// The sheet's safety cautions: the engine's own warnings about voltage above the extra-low-voltage band, RF power and
/// hot surfaces (the same words as on the plan page), then a closing line that defers to local codes and licensed
/// practice. A plan without operating conditions gets a caution that nothing was checked.
/// </summary>
public static class SheetCautions
{
    /// <summary>Code of the closing caution that defers to local codes.</summary>
    public const string LocalCodes = "local-codes";

    /// <summary>Code of the caution for a plan without operating conditions.</summary>
    public const string NoOperatingConditions = "no-operating-conditions";

    /// <summary>The engine's warning codes that are safety cautions.</summary>
    public static IReadOnlySet<string> SafetyCodes { get; } = new HashSet<string>(StringComparer.Ordinal)
    {
        WarningCodes.AboveExtraLowVoltage,
        WarningCodes.HighPower,
        WarningCodes.Hot,
    };

    /// <summary>The cautions for <paramref name="plan"/>.</summary>
    public static IReadOnlyList<SheetCaution> For(TransformerPlan plan, PlanEvaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(evaluation);
        var cautions = evaluation.Warnings
            .Where(w => SafetyCodes.Contains(w.Code) && w.Severity >= WarningSeverity.Caution)
            .Select(w => new SheetCaution(w.Code, w.Message))
            .ToList();
        if (plan.Operating is null)
        {
            cautions.Add(new SheetCaution(NoOperatingConditions,
                "The plan gives no band, drive or load, so its voltage, power and temperature were not checked. Add them on the plan page before using this part where any of them may be high."));
        }

        if (cautions.Count > 0)
        {
            cautions.Add(new SheetCaution(LocalCodes,
                "These cautions are general. They do not replace the safety standards for your equipment: follow your local electrical codes and the conditions of your licence, and leave mains-connected work to licensed practice."));
        }

        return cautions;
    }
}
