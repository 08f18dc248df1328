using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Standards;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Reports.Model;

/// <summary>The sheet's own prose: the build notes and the cautions, with the design's figures filled in.</summary>
internal static class SheetTexts
{
    public static BuildNotes BuildNotes(DesignInput input, EvaluationResult r)
    {
        var b = r.Balancing;
        var target = F.CellVoltage(b.TargetCellVoltage).Text;
        var spread = F.Trimmed(b.AcceptanceSpreadMillivolt, 1) + " mV";
        var finish = F.Current(r.Charger.TerminationCurrentA).Text;
        var p = r.Pack.Parallel;
        var groups = r.Pack.Series;
        if (input.Balancing == BalancingMethod.Bottom)
        {
            return new BuildNotes(
                "Bottom balancing",
                $"The string is matched at the bottom: every parallel group is brought to the same rest voltage near empty before the series links are made. Target {target} per cell, that is per group of {p}, accepted within {spread}.",
                [
                    $"Assemble the {groups} parallel groups of {p} cells each and number them 1 to {groups}. Leave every series link, the fuse and the service disconnect out.",
                    $"Discharge each group on its own towards {target}. As the voltage approaches the target, lower the current and finish at no more than {finish} per group.",
                    "Disconnect the load and let the group rest for at least one hour, then measure its rest voltage at the cell terminals with a calibrated meter.",
                    $"If a group rests more than {spread} above {target}, discharge it again at the finishing current and rest it again; if it rests below, charge it back up at the same small current.",
                    $"Accept the set when every group rests at {target} and the highest and lowest groups differ by no more than {spread}. Record each group's rest voltage.",
                    $"Make the series links, fit the fuse last, and check that the string reads about {F.PackVoltage(b.TargetCellVoltage * groups).Text} ({groups} × {target}).",
                    $"Program the BMS from the BMS settings, with top balancing {(b.BmsTopBalancingEnabled ? "on" : "off")}, and the charger from the charger settings: a BMS that balances at the top would undo the bottom match.",
                    "On the first charge, watch the highest group: it must stay below the over-voltage release when the charger ends the charge.",
                ]);
        }

        var start = b.BmsBalanceStartVoltage is { } s ? F.CellVoltage(s).Text : target;
        return new BuildNotes(
            "Top balancing",
            $"The string is matched at the top by the BMS: cells above {start} are bled until the groups agree within {spread} at the end of charge. The smallest group empties first, so the controller's cut-off and the BMS under-voltage trip guard the bottom.",
            [
                $"Assemble the {groups} parallel groups of {p} cells each and check that every group rests within a few tens of millivolts of the others before linking them.",
                "Program the BMS from the BMS settings (top balancing on) and the charger from the charger settings.",
                $"Charge to the end of charge and let the BMS balance; repeat until the groups agree within {spread} at the end of charge.",
            ]);
    }

    public static IReadOnlyList<Caution> Cautions(EvaluationResult r)
    {
        var max = F.PackVoltage(r.Pack.MaxVoltage).Text;
        var cls = r.Pack.VoltageClass switch
        {
            VoltageClass.A => "class A: at or below 60 V DC",
            VoltageClass.B => "class B: above 60 V DC",
            _ => "above class B: more than 1500 V DC",
        };
        var chargeMin = F.Temperature(r.CellThresholds.ChargeTemperatureLowTripC).Text;
        var cellMin = F.Temperature(r.Cell.ChargeTemperatureMinC).Text;
        return
        [
            new("hazardous-voltage", "Hazardous voltage",
                $"Above 60 V DC a battery is voltage class B under ISO 6469-3 and a shock hazard. This pack reaches {max} ({cls}). Class B calls for protection against direct contact (enclosures and barriers, orange-marked high-voltage cables, warning labels), isolation from the chassis, a service disconnect, and work done de-energised: open and lock out the disconnect, then prove the absence of voltage with a meter rated for it before touching anything."),
            new("stored-energy", "Stored energy and short-circuit current",
                $"The pack stores about {F.Energy(r.Energy.NominalEnergyWh).Text} and can drive a prospective short-circuit current of about {F.Current(r.Protection.ProspectiveShortCircuitA).Text}. A dropped tool across its terminals can melt metal, cause arc-flash burns and start a fire. Disconnecting the load does not discharge it."),
            new("tools-ppe", "Insulated tools and protective equipment",
                "Use insulated tools rated for the voltage, insulating gloves, and eye and face protection; remove rings, watches and other metal. Cover every terminal that is not being worked on."),
            new("fuse-position", "Fuse position",
                "Place the main fuse as close to the cells as practical, so that as little conductor as possible is left unprotected between the cells and the fuse."),
            new("cold-charging", "No charging when cold",
                $"Charging must be inhibited below {chargeMin} (the cell's charge minimum is {cellMin}): charging a graphite-anode cell below its limit plates lithium, which damages it for good and can lead to internal shorts."),
            new("no-float", "No float charge",
                "Lithium cells take no float charge: turn off any float or maintenance stage of the charger. Holding a voltage above the rest voltage keeps charging the cells."),
            new("swollen-cell", "Swollen cells",
                "A swollen cell is a damaged cell: take it out of service, do not charge, compress or puncture it, and store it apart from flammable material until it is disposed of."),
            new("over-discharged", "Over-discharged cells",
                "A cell that was over-discharged to near 0 V must not be recharged: it may have internal copper shorts. Replace it."),
            new("estimates", "Design estimates",
                "Every figure on this sheet is a design estimate computed from the entered figures and typical values; it is not a test result or a certification."),
            new("governing", "What governs",
                "The cell maker's datasheet, local electrical and vehicle codes, the authority having jurisdiction and licensed practice govern over this sheet wherever they differ from it."),
        ];
    }
}
