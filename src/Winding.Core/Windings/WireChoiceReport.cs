namespace Winding.Core.Windings;

/// <summary>
/// The outcome of <see cref="WireGaugePicker.ChooseWithReport"/>: the ordered choices and, per rule, how many of the
/// candidates tried broke it, with a short summary in plain words. Rejected (not listed) are the candidates that
/// leave a winding that does not fit or that exceed the winding's share of the window; the current-density and
/// skin-depth counts cover every candidate tried, listed or not. A candidate can break several rules.
/// </summary>
/// <param name="Choices">The choices, best first, at most <see cref="WireChoiceOptions.MaximumChoices"/>.</param>
/// <param name="SingleWiresTried">Standard wires tried as a single wire.</param>
/// <param name="StrandSetsTried">Strands-in-hand sets tried (0 when a single wire meets every rule).</param>
/// <param name="DoesNotFitCount">Candidates rejected because a winding of the plan would not fit.</param>
/// <param name="OverWindowShareCount">Candidates rejected because their copper exceeds the winding's share.</param>
/// <param name="AboveCurrentDensityCount">Candidates tried whose current density is above the limit.</param>
/// <param name="AboveSkinDepthCount">Candidates tried whose conductor is thicker than the skin-depth limit.</param>
/// <param name="AcceptedCount">Candidates that fit and keep within the share, before the list is cut to length.</param>
/// <param name="PassingCount">Accepted candidates that also meet the current-density and skin-depth rules.</param>
/// <param name="CopperLimitM2">The winding's copper limit, share × window area × 0.4, m².</param>
/// <param name="Summary">The counts in plain words.</param>
public sealed record WireChoiceReport(
    IReadOnlyList<WireChoice> Choices,
    int SingleWiresTried,
    int StrandSetsTried,
    int DoesNotFitCount,
    int OverWindowShareCount,
    int AboveCurrentDensityCount,
    int AboveSkinDepthCount,
    int AcceptedCount,
    int PassingCount,
    double CopperLimitM2,
    string Summary);
