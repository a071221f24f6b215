package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilCase;
import org.finstack.core.Numbers;
import org.finstack.io.CaseFiles;
import org.finstack.io.FanFiles;
import org.finstack.study.fouling.CoilFan;
import org.finstack.study.frost.FrostStudy;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack frost CASE.json --hours H}: frost build-up on an evaporator over time with the
 * case's fan in the loop, and the defrost interval.
 */
@Command(name = "frost", mixinStandardHelpOptions = true,
        description = "Frost build-up on an evaporator over time, with the fan in the loop, to the defrost interval.")
final class FrostCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE", description = "case file (JSON), optionally with a \"fan\"")
    private Path caseFile;

    @Option(names = "--hours", paramLabel = "H", required = true, description = "time to march [h]")
    private double hours;

    @Option(names = "--steps", paramLabel = "N", defaultValue = "24",
            description = "time steps, 1 to 2000 (default: ${DEFAULT-VALUE})")
    private int steps;

    @Option(names = "--threshold", paramLabel = "FRACTION", defaultValue = "0.7",
            description = "defrost when capacity or airflow falls below this share of clean (default: ${DEFAULT-VALUE})")
    private double threshold;

    @Option(names = "--json", description = "print one JSON object (SI values, time in hours) instead of a table")
    private boolean json;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Override
    public Integer call() throws Exception {
        UnitSystem u = Output.system(units);
        CoilCase c = CaseFiles.read(caseFile);
        CoilFan fan = FanFiles.read(caseFile).orElse(null);
        FrostStudy.FrostResult r = Output.asOptions(Map.of("hours", "--hours", "steps", "--steps", "threshold",
                "--threshold"), () -> FrostStudy.march(c, fan, hours, steps, threshold));
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("frost", caseFile);
            ObjectNode res = root.putObject("results");
            res.put("frosting", r.frosting());
            if (fan == null) {
                res.putNull("fan");
            } else {
                res.put("fan", fan.describe());
            }
            res.put("airflowHeldConstant", fan == null);
            res.put("threshold", threshold);
            number(res, "frostSurfaceTemperature_K", r.surfaceTemperature());
            number(res, "frostDensity_kg_m3", r.density());
            number(res, "frostConductivity_W_mK", r.conductivity());
            number(res, "defrostInterval_h", r.defrostInterval());
            ArrayNode tl = res.putArray("timeline");
            for (FrostStudy.FrostPoint p : r.timeline()) {
                ObjectNode o = tl.addObject();
                o.put("time_h", p.time());
                o.put("frostMass_kg", p.frostMass());
                o.put("frostThickness_m", p.frostThickness());
                o.put("airflow_m3_s", p.airflow());
                o.put("capacity_W", p.capacity());
                o.put("airPressureDrop_Pa", p.airPressureDrop());
                if (!Double.isNaN(p.fanPower())) {
                    o.put("fanPower_W", p.fanPower());
                }
            }
            ArrayNode notes = res.putArray("notes");
            r.notes().forEach(notes::add);
            ArrayNode warnings = res.putArray("warnings");
            r.warnings().forEach(warnings::add);
            out.println(Output.pretty(root));
            return 0;
        }
        out.println("Frost on " + c.coil().rows() + " rows x " + c.coil().tubesPerRow() + " tubes at "
                + Quantities.format(c.coil().finPitch(), Dimension.FIN_PITCH, u) + " fin pitch, "
                + c.refrigerant().fluid() + " at " + Quantities.format(c.refrigerant().saturationTemperature(),
                        Dimension.TEMPERATURE, u));
        out.println("Fan: " + (fan == null ? "none given" : fan.describe()));
        if (r.frosting()) {
            out.println("Frost density " + Quantities.format(r.density(), Dimension.DENSITY, u) + ", conductivity "
                    + Quantities.format(r.conductivity(), Dimension.CONDUCTIVITY, u));
        }
        out.println();
        out.printf(Locale.ROOT, "  %-8s %-12s %-12s %-14s %-14s %s%n", "time", "frost", "thickness", "airflow",
                "capacity", "pressure drop");
        for (FrostStudy.FrostPoint p : r.timeline()) {
            out.printf(Locale.ROOT, "  %-8s %-12s %-12s %-14s %-14s %s%n", Numbers.brief(p.time()) + " h",
                    Quantities.format(p.frostMass(), Dimension.MASS, u),
                    Quantities.format(p.frostThickness(), Dimension.LENGTH, u, u == UnitSystem.SI ? "mm" : "in"),
                    Quantities.format(p.airflow(), Dimension.VOLUME_FLOW, u),
                    Quantities.format(p.capacity(), Dimension.HEAT_FLOW, u),
                    Quantities.format(p.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u));
        }
        out.println();
        out.println(Double.isNaN(r.defrostInterval()) ? "Defrost interval: not reached within " + Numbers.brief(hours) + " h"
                : "Defrost interval: " + Numbers.brief(r.defrostInterval()) + " h");
        r.notes().forEach(n -> out.println("  * " + n));
        r.warnings().forEach(w -> out.println("  ! " + w));
        return 0;
    }

    private static void number(ObjectNode o, String key, double v) {
        if (Double.isNaN(v)) {
            o.putNull(key);
        } else {
            o.put(key, v);
        }
    }
}
