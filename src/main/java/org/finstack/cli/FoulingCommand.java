package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilCase;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.io.CaseFiles;
import org.finstack.io.FanFiles;
import org.finstack.study.fouling.CoilFan;
import org.finstack.study.fouling.FoulingLevel;
import org.finstack.study.fouling.FoulingStudy;
import org.finstack.study.fouling.InsideFouling;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack fouling CASE.json}: capacity, airflow and air pressure drop of the case's coil
 * from clean to heavily fouled by an air-side dust deposit, with the case's fan (key
 * {@code "fan"}) in the loop; and the fouling level behind a measured rise of the pressure drop.
 */
@Command(name = "fouling", mixinStandardHelpOptions = true,
        description = "Capacity, airflow and air pressure drop against air-side fouling, with the fan in the loop.")
final class FoulingCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE", description = "case file (JSON), optionally with a \"fan\"")
    private Path caseFile;

    @Option(names = "--json", description = "print one JSON object (SI values) instead of a table")
    private boolean json;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Option(names = "--levels", paramLabel = "N", defaultValue = "6",
            description = "fouling levels from clean to heavy, 2 to 200 (default: ${DEFAULT-VALUE})")
    private int levels;

    @Option(names = "--max-thickness", paramLabel = "LENGTH",
            description = "deposit thickness of the heaviest level, e.g. \"0.3 mm\" (default: the deposit filling 40 % of the fin gap)")
    private String maxThickness;

    @Option(names = "--deposit-conductivity", paramLabel = "K",
            description = "effective conductivity of the deposit, e.g. \"0.1 W/(m K)\" (default 0.1, from memory)")
    private String depositConductivity;

    @Option(names = "--inside-fouling", paramLabel = "R",
            description = "oil-film resistance inside the tubes, e.g. \"0.00035 m2 K/W\" (TEMA: oil-bearing refrigerant vapour);"
                    + " replaces the case's fouling.inside")
    private String insideFouling;

    @Option(names = "--measured-rise", paramLabel = "DP",
            description = "measured rise of the air pressure drop across the coil from clean to now, e.g. \"35 Pa\"")
    private String measuredRise;

    @Option(names = "--measured-ratio", paramLabel = "RATIO",
            description = "measured pressure drop now over clean, e.g. 1.4 (instead of --measured-rise)")
    private Double measuredRatio;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        CoilCase c = CaseFiles.read(caseFile);
        CoilFan fan = FanFiles.read(caseFile).orElse(null);
        if (insideFouling != null) {
            CoilCase clean = c;
            double r = Quantities.parse("--inside-fouling", insideFouling, Dimension.FOULING_RESISTANCE);
            c = Output.asOptions(Map.of("insideFouling", "--inside-fouling"), () -> InsideFouling.withOilFilm(clean,
                    r));
        }
        double k = depositConductivity == null ? FoulingLevel.DUST_CONDUCTIVITY
                : Quantities.parse("--deposit-conductivity", depositConductivity, Dimension.CONDUCTIVITY);
        double heavy = maxThickness == null ? FoulingStudy.heavyThickness(c)
                : Quantities.parse("--max-thickness", maxThickness, Dimension.LENGTH);
        if (measuredRise != null && measuredRatio != null) {
            throw new InputException("--measured-rise", Msg.EXCLUSIVE, "--measured-rise", "--measured-ratio");
        }
        CoilCase rated = c;
        Map<String, String> options = Map.of("levels", "--levels", "maxThickness", "--max-thickness",
                "depositThickness", "--max-thickness", "depositConductivity", "--deposit-conductivity",
                "measuredRise", measuredRatio != null ? "--measured-ratio" : "--measured-rise",
                "measuredRatio", "--measured-ratio");
        FoulingStudy.FoulingCurve curve = Output.asOptions(options, () -> FoulingStudy.curve(rated, fan, k, heavy,
                levels));
        FoulingStudy.Inferred inferred = null;
        if (measuredRise != null || measuredRatio != null) {
            double rise = measuredRise != null
                    ? Quantities.parse("--measured-rise", measuredRise, Dimension.PRESSURE_DIFFERENCE)
                    : Output.asOptions(options, () -> FoulingStudy.riseFromRatio(rated, fan, measuredRatio));
            inferred = Output.asOptions(options, () -> FoulingStudy.infer(rated, fan, k, rise));
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(Output.pretty(json(c, fan, k, curve, inferred)));
        } else {
            table(out, system, c, fan, k, curve, inferred);
        }
        return 0;
    }

    private ObjectNode json(CoilCase c, CoilFan fan, double k, FoulingStudy.FoulingCurve curve,
            FoulingStudy.Inferred inferred) {
        ObjectNode root = Output.envelope("fouling", caseFile);
        ObjectNode r = root.putObject("results");
        if (fan == null) {
            r.putNull("fan");
        } else {
            r.put("fan", fan.describe());
        }
        r.put("airflowHeldConstant", fan == null);
        r.put("depositConductivity_W_mK", k);
        r.put("insideFouling_m2K_W", c.fouling().inside());
        r.put("airSideFouling_m2K_W", c.fouling().airSide());
        ArrayNode points = r.putArray("curve");
        curve.points().forEach(p -> point(points.addObject(), p));
        if (inferred != null) {
            ObjectNode inf = r.putObject("inferred");
            inf.put("measuredRise_Pa", inferred.measuredRise());
            point(inf, inferred.level());
            inf.put("evaluations", inferred.evaluations());
        }
        ArrayNode notes = r.putArray("notes");
        curve.notes().forEach(notes::add);
        ArrayNode warnings = r.putArray("warnings");
        curve.warnings().forEach(warnings::add);
        return root;
    }

    private static void point(ObjectNode o, FoulingStudy.FoulingPoint p) {
        ObjectNode level = o.putObject("level");
        level.put("depositThickness_m", p.thickness());
        level.put("blockedFraction", p.blockedFraction());
        level.put("depositResistance_m2K_W", p.depositResistance());
        o.put("capacity_W", p.capacity());
        o.put("airflow_m3_s", p.airflow());
        o.put("airPressureDrop_Pa", p.airPressureDrop());
        o.put("capacityLossFraction", p.capacityLossFraction());
        if (!Double.isNaN(p.fanPower())) {
            o.put("fanPower_W", p.fanPower());
        }
    }

    private static void table(PrintWriter out, UnitSystem u, CoilCase c, CoilFan fan, double k,
            FoulingStudy.FoulingCurve curve, FoulingStudy.Inferred inferred) {
        out.println("Air-side fouling of " + c.coil().rows() + " rows x " + c.coil().tubesPerRow() + " tubes, "
                + c.coil().finType() + " fins, " + c.refrigerant().fluid() + " " + c.refrigerant().duty().id());
        out.println("Fan: " + (fan == null ? "none given" : fan.describe()) + "; deposit conductivity "
                + Quantities.format(k, Dimension.CONDUCTIVITY, u));
        out.println();
        out.printf(Locale.ROOT, "  %-14s %-9s %-14s %-14s %-14s %-8s %s%n", "deposit", "blocked", "capacity", "airflow",
                "pressure drop", "loss", Double.isNaN(curve.points().get(0).fanPower()) ? "" : "fan power");
        for (FoulingStudy.FoulingPoint p : curve.points()) {
            row(out, u, p);
        }
        if (inferred != null) {
            out.println();
            out.println("From the measured rise of " + Quantities.format(inferred.measuredRise(),
                    Dimension.PRESSURE_DIFFERENCE, u) + ":");
            row(out, u, inferred.level());
        }
        if (!curve.notes().isEmpty()) {
            out.println();
            curve.notes().forEach(n -> out.println("  * " + n));
        }
        if (!curve.warnings().isEmpty()) {
            out.println();
            curve.warnings().forEach(w -> out.println("  ! " + w));
        }
    }

    private static void row(PrintWriter out, UnitSystem u, FoulingStudy.FoulingPoint p) {
        out.printf(Locale.ROOT, "  %-14s %-9s %-14s %-14s %-14s %-8s %s%n",
                Quantities.format(p.thickness(), Dimension.LENGTH, u, u == UnitSystem.SI ? "mm" : "in"),
                Numbers.brief(100 * p.blockedFraction()) + " %",
                Quantities.format(p.capacity(), Dimension.HEAT_FLOW, u),
                Quantities.format(p.airflow(), Dimension.VOLUME_FLOW, u),
                Quantities.format(p.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u),
                Numbers.brief(100 * p.capacityLossFraction()) + " %",
                Double.isNaN(p.fanPower()) ? "" : Quantities.format(p.fanPower(), Dimension.POWER, u));
    }
}
