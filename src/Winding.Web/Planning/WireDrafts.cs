using Winding.Catalogue.Plans;

namespace Winding.Web.Planning;

/// <summary>
/// Moves a winding's wire between its draft (<see cref="WindingDraft"/>) and the plan document's <c>wire</c> object:
/// every form the document takes, so that a loaded wire of any form is edited in place and written back unchanged.
/// </summary>
internal static class WireDrafts
{
    /// <summary>The form a document wire is given in (the first form found when it gives several).</summary>
    public static WireForm FormOf(PlanWireDocument? wire) => wire switch
    {
        { StandardId: not null } => WireForm.Table,
        { MetricMm: not null } or { Grade: not null } => WireForm.Metric,
        { Awg: not null } or { Build: not null } => WireForm.Awg,
        { Litz: not null } => WireForm.Litz,
        { HookUp: not null } => WireForm.HookUp,
        _ => WireForm.Custom,
    };

    /// <summary>Fills the wire fields of <paramref name="draft"/> from a document wire.</summary>
    public static void Load(WindingDraft draft, PlanWireDocument? wire)
    {
        draft.WireForm = FormOf(wire);
        draft.StandardId = wire?.StandardId;
        draft.MetricSize = LengthText(wire?.MetricMm);
        draft.MetricGrade = DraftReading.Show(wire?.Grade);
        draft.AwgGauge = DraftReading.Show(wire?.Awg);
        draft.AwgBuild = wire?.Build ?? string.Empty;
        draft.ConductorDiameter = LengthText(wire?.ConductorDiameterMm);
        draft.OverallDiameter = LengthText(wire?.OverallDiameterMm);
        draft.LitzStrands = DraftReading.Show(wire?.Litz?.Strands);
        draft.LitzStrandDiameter = LengthText(wire?.Litz?.StrandDiameterMm);
        draft.LitzOverallDiameter = LengthText(wire?.Litz?.OverallDiameterMm);
        draft.HookUpConductor = LengthText(wire?.HookUp?.ConductorDiameterMm);
        draft.HookUpInsulation = LengthText(wire?.HookUp?.InsulationThicknessMm);
        draft.Metal = wire?.Metal ?? string.Empty;
        draft.StrandsInHand = DraftReading.Show(wire?.StrandsInHand);
    }

    /// <summary>The document wire of the draft's chosen form; texts that are not numbers become errors under <paramref name="prefix"/>.</summary>
    public static PlanWireDocument Build(WindingDraft draft, string prefix, Dictionary<string, string> errors)
    {
        var wire = new PlanWireDocument
        {
            StrandsInHand = DraftReading.Whole(errors, $"{prefix}.strandsInHand", draft.StrandsInHand, "Wires in hand", required: false),
            Metal = DraftReading.Word(draft.Metal),
        };
        switch (draft.WireForm)
        {
            case WireForm.Table:
                wire.StandardId = draft.StandardId;
                if (draft.StandardId is null)
                {
                    errors[$"{prefix}.standardId"] = "Pick a wire from the table: type part of its size to search, or use Suggest wire.";
                }

                break;
            case WireForm.Metric:
                wire.MetricMm = DraftReading.Length(errors, $"{prefix}.metricMm", draft.MetricSize, "Nominal size", required: true);
                wire.Grade = DraftReading.Whole(errors, $"{prefix}.grade", draft.MetricGrade, "Grade", required: false);
                break;
            case WireForm.Awg:
                wire.Awg = DraftReading.Whole(errors, $"{prefix}.awg", draft.AwgGauge, "AWG", required: true);
                wire.Build = DraftReading.Word(draft.AwgBuild);
                break;
            case WireForm.Litz:
                wire.Litz = new PlanLitzDocument
                {
                    Strands = DraftReading.Whole(errors, $"{prefix}.litz.strands", draft.LitzStrands, "Strands", required: false),
                    StrandDiameterMm = DraftReading.Length(errors, $"{prefix}.litz.strandDiameterMm", draft.LitzStrandDiameter, "Strand diameter", required: false),
                    OverallDiameterMm = DraftReading.Length(errors, $"{prefix}.litz.overallDiameterMm", draft.LitzOverallDiameter, "Bundle diameter", required: false),
                };
                break;
            case WireForm.HookUp:
                wire.HookUp = new PlanHookUpDocument
                {
                    ConductorDiameterMm = DraftReading.Length(errors, $"{prefix}.hookUp.conductorDiameterMm", draft.HookUpConductor, "Conductor diameter", required: false),
                    InsulationThicknessMm = DraftReading.Length(errors, $"{prefix}.hookUp.insulationThicknessMm", draft.HookUpInsulation, "Insulation thickness", required: false),
                };
                break;
            default:
                wire.ConductorDiameterMm = DraftReading.Length(errors, $"{prefix}.conductorDiameterMm", draft.ConductorDiameter, "Conductor diameter", required: true);
                wire.OverallDiameterMm = DraftReading.Length(errors, $"{prefix}.overallDiameterMm", draft.OverallDiameter, "Overall diameter", required: false);
                break;
        }

        return wire;
    }

    private static string LengthText(double? millimetres) => Winding.Web.Display.LengthText.ForDraft(millimetres);
}
