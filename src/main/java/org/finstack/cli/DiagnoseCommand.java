package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.finstack.coil.Duty;
import org.finstack.core.Citation;
import org.finstack.io.MeasurementFiles;
import org.finstack.study.cost.CleaningPayback;
import org.finstack.study.diagnosis.DepositLevel;
import org.finstack.study.diagnosis.Diagnosis;
import org.finstack.study.diagnosis.Estimate;
import org.finstack.study.diagnosis.HealthyRanges;
import org.finstack.study.diagnosis.Measurements;
import org.finstack.study.diagnosis.Reading;
import org.finstack.study.uncertainty.NormalCoverage;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack diagnose MEASUREMENTS.json}: infers a coil's present UA and equivalent
 * air-side fouling from field readings, with the clean coil, the loss, the dust deposit level
 * behind the loss (and behind the air pressure drop, when it was measured), their uncertainty,
 * the readings against a healthy coil's ranges and, with cleaning data, the payback.
 */
@Command(name = "diagnose", mixinStandardHelpOptions = true,
        description = {"Infers a coil's fouling, its dust deposit level and the lost capacity from field measurements.",
                "With measured.airPressureDrop in the file the deposit level is also inferred from the pressure drop."})
final class DiagnoseCommand implements Callable<Integer> {

    /** How the fouling level is defined. */
    static final String LEVEL_DEFINITION = "resistance-based: the inferred air-side fouling resistance of the whole coil,"
            + " R_f / (eta_o A_o), as a fraction of the clean coil's total resistance 1 / UA_clean";

    /** How the deposit level is defined. */
    static final String DEPOSIT_DEFINITION = "thickness of a dust layer on every air-side surface (JSON: metres), in the"
            + " terms of the fouling study (conductivity " + org.finstack.core.Numbers.brief(
                    org.finstack.study.fouling.FoulingLevel.DUST_CONDUCTIVITY) + " W/(m K), from memory; passages"
            + " narrowed by the layer): depositLevel from the lost duty (k x R_f), depositLevelFromPressureDrop from the"
            + " measured air pressure drop's rise over the clean coil's at the measured airflow; blocked fraction = share"
            + " of the clean minimum free-flow area";

    /** How the ranges are found. */
    static final String UNCERTAINTY_METHOD = "linear propagation (JCGM 100:2008 eq. 10, inputs uncorrelated) of the"
            + " readings' stated accuracies (limits ±a, standard uncertainty a / sqrt 3) and of the air-side"
            + " correlation's published j scatter (normal, sigma from the share within its band; for the deposit level"
            + " from the pressure drop, its f scatter); the deposit conductivity is not in the ranges; p10/p90 = value"
            + " -/+ 1.2816 u";

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "MEASUREMENTS", description = "measurement file (JSON)")
    private Path file;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Option(names = "--json", description = "print one JSON object (SI values) instead of a table")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        MeasurementFiles.MeasurementFile mf = MeasurementFiles.read(file);
        Diagnosis d = Diagnosis.of(mf.template(), mf.measurements(), mf.cleaning());
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("diagnose", file);
            root.set("results", results(d));
            out.println(Output.pretty(root));
        } else {
            table(out, mf, d, system);
        }
        return 0;
    }

    static ObjectNode results(Diagnosis d) {
        ObjectNode o = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode();
        o.put("duty", d.measurements().duty().id());
        o.put("matchedBasis", d.basis().id());
        o.put("measuredDuty_W", d.measuredDuty().value());
        o.put("UA_W_K", d.ua().value());
        o.put("cleanUA_W_K", d.cleanUa().value());
        o.put("foulingLevel", d.foulingLevel().value());
        o.put("foulingLevelDefinition", LEVEL_DEFINITION);
        o.put("airSideFouling_m2K_W", d.airSideFouling().value());
        o.put("capacityNow_W", d.capacityNow().value());
        o.put("capacityClean_W", d.capacityClean().value());
        o.put("capacityLossFraction", d.capacityLossFraction().value());
        o.put("depositLevel", d.depositLevel().thickness().value());
        d.depositLevel().blockedFraction().ifPresent(b -> o.put("depositBlockedFraction", b.value()));
        d.depositLevelFromPressureDrop().ifPresent(p -> {
            o.put("depositLevelFromPressureDrop", p.thickness().value());
            p.blockedFraction().ifPresent(b -> o.put("depositBlockedFractionFromPressureDrop", b.value()));
        });
        o.put("depositConductivity_W_mK", d.depositLevel().conductivity());
        o.put("depositMaxThickness_m", d.depositLevel().maxThickness());
        o.put("depositLevelDefinition", DEPOSIT_DEFINITION);
        ObjectNode u = o.putObject("uncertainty");
        u.put("method", UNCERTAINTY_METHOD);
        range(u, "measuredDuty_W", d.measuredDuty());
        range(u, "UA_W_K", d.ua());
        range(u, "cleanUA_W_K", d.cleanUa());
        range(u, "foulingLevel", d.foulingLevel());
        range(u, "airSideFouling_m2K_W", d.airSideFouling());
        range(u, "capacityNow_W", d.capacityNow());
        range(u, "capacityClean_W", d.capacityClean());
        range(u, "capacityLossFraction", d.capacityLossFraction());
        range(u, "depositLevel", d.depositLevel().thickness());
        d.depositLevel().blockedFraction().ifPresent(b -> range(u, "depositBlockedFraction", b));
        d.depositLevelFromPressureDrop().ifPresent(p -> {
            range(u, "depositLevelFromPressureDrop", p.thickness());
            p.blockedFraction().ifPresent(b -> range(u, "depositBlockedFractionFromPressureDrop", b));
        });
        ObjectNode budget = u.putObject("airSideFoulingBudget_m2K_W");
        d.foulingBudget().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> budget.put(e.getKey(), e.getValue()));
        Measurements m = d.measurements();
        ObjectNode measured = o.putObject("measured");
        measured(measured, "airInletTemperature_C", m.airInletTemperature(), 273.15);
        measured(measured, "airOutletTemperature_C", m.airOutletTemperature(), 273.15);
        measured(measured, "airInletRelativeHumidity", m.airInletRelativeHumidity(), 0);
        if (m.airOutletRelativeHumidity() != null) {
            measured(measured, "airOutletRelativeHumidity", m.airOutletRelativeHumidity(), 0);
        }
        measured(measured, "volumeFlow_m3_s", m.volumeFlow(), 0);
        measured(measured, "saturationTemperature_C", m.saturationTemperature(), 273.15);
        measured(measured, m.outletConditionName() + "_K", m.outletCondition(), 0);
        if (m.refrigerantMassFlow() != null) {
            measured(measured, "massFlow_kg_s", m.refrigerantMassFlow(), 0);
        }
        if (m.airPressureDrop() != null) {
            measured(measured, "airPressureDrop_Pa", m.airPressureDrop(), 0);
        }
        ArrayNode readings = o.putArray("readings");
        for (HealthyRanges.RangeCheck rc : d.ranges()) {
            readings.addObject().put("name", rc.name()).put("value", rc.value()).put("unit", rc.unit())
                    .put("healthyLow", rc.low()).put("healthyHigh", rc.high()).put("status", rc.status())
                    .put("basis", HealthyRanges.BASIS);
        }
        if (d.now().refrigerant() != null) {
            o.put("refrigerantMassFlowModel_kg_s", d.now().refrigerant().massFlow());
        }
        d.payback().ifPresent(p -> payback(o.putObject("payback"), p));
        ArrayNode warnings = o.putArray("warnings");
        d.warnings().forEach(warnings::add);
        ArrayNode methods = o.putArray("methods");
        for (Citation c : d.now().methods()) {
            methods.addObject().put("key", c.key()).put("reference", c.reference());
        }
        methods.addObject().put("key", NormalCoverage.SOURCE.key()).put("reference", NormalCoverage.SOURCE.reference());
        return o;
    }

    /** A reading with its stated accuracy (limit ±a) and standard uncertainty; offset turns kelvin into Celsius. */
    private static void measured(ObjectNode o, String key, Reading r, double offset) {
        o.putObject(key).put("value", r.value() - offset).put("accuracy", r.accuracy())
                .put("standardUncertainty", r.standardUncertainty());
    }

    private static void range(ObjectNode u, String key, Estimate e) {
        u.putObject(key).put("standardUncertainty", e.standardUncertainty()).put("p10", e.low()).put("p90", e.high());
    }

    private static void payback(ObjectNode p, CleaningPayback pb) {
        p.put("saturationShift_K", pb.cleaningCase().saturationShift());
        p.put("cleanCompressorPower_W", pb.cleanCompressorPower());
        p.put("dirtyCompressorPower_W", pb.dirtyCompressorPower());
        p.put("extraEnergyPerYear_kWh", pb.extraEnergyPerYear() / 3.6e6);
        p.put("costPerYear", pb.costPerYear());
        p.put("currency", pb.cleaningCase().tariff().currency());
        if (pb.paybackYears().isPresent()) {
            p.put("paybackYears", pb.paybackYears().getAsDouble());
        } else {
            p.putNull("paybackYears");
        }
        p.put("summary", pb.summary());
    }

    private static void table(PrintWriter out, MeasurementFiles.MeasurementFile mf, Diagnosis d, UnitSystem u) {
        Measurements m = d.measurements();
        Output.Table t = new Output.Table(out, u);
        out.println("Diagnosis of " + (mf.name().isBlank() ? "the coil" : mf.name()));
        t.section("Readings (healthy range: " + HealthyRanges.BASIS + ")");
        reading(out, u, "air in", m.airInletTemperature(), Dimension.TEMPERATURE);
        reading(out, u, "air out", m.airOutletTemperature(), Dimension.TEMPERATURE);
        reading(out, u, "airflow", m.volumeFlow(), Dimension.VOLUME_FLOW);
        reading(out, u, "saturation", m.saturationTemperature(), Dimension.TEMPERATURE);
        reading(out, u, m.outletConditionName(), m.outletCondition(), Dimension.TEMPERATURE_DIFFERENCE);
        if (m.airPressureDrop() != null) {
            reading(out, u, "air pressure drop", m.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE);
        }
        for (HealthyRanges.RangeCheck rc : d.ranges()) {
            out.printf(Locale.ROOT, "  %-26s %.2f %s   healthy %s to %s %s  %s%n", rc.name(), rc.value(), rc.unit(),
                    org.finstack.core.Numbers.brief(rc.low()), org.finstack.core.Numbers.brief(rc.high()), rc.unit(),
                    rc.typical() ? "ok" : "<< " + rc.status().toUpperCase(Locale.ROOT));
        }
        t.section("Result (" + d.basis().id() + " duty matched; range 10th to 90th percentile)");
        estimate(out, u, "measured " + d.basis().id() + " duty", d.measuredDuty(), Dimension.HEAT_FLOW);
        estimate(out, u, "capacity now (total)", d.capacityNow(), Dimension.HEAT_FLOW);
        estimate(out, u, "capacity clean (total)", d.capacityClean(), Dimension.HEAT_FLOW);
        out.printf(Locale.ROOT, "  %-26s %.1f %%   (%.1f to %.1f %%)%n", "capacity lost", 100 * d.capacityLossFraction().value(),
                100 * d.capacityLossFraction().low(), 100 * d.capacityLossFraction().high());
        estimate(out, u, "UA now", d.ua(), Dimension.UA);
        estimate(out, u, "UA clean", d.cleanUa(), Dimension.UA);
        estimate(out, u, "air-side fouling", d.airSideFouling(), Dimension.FOULING_RESISTANCE);
        out.printf(Locale.ROOT, "  %-26s %.3f   (%.3f to %.3f)%n", "fouling level", d.foulingLevel().value(),
                d.foulingLevel().low(), d.foulingLevel().high());
        out.println("    (" + LEVEL_DEFINITION + ")");
        deposit(out, u, "deposit (from duty)", d.depositLevel());
        d.depositLevelFromPressureDrop().ifPresent(p -> deposit(out, u, "deposit (from air dp)", p));
        out.println("    (" + DEPOSIT_DEFINITION + ")");
        out.println("    (uncertainty: " + UNCERTAINTY_METHOD + ")");
        d.payback().ifPresent(p -> {
            t.section("Cleaning");
            t.row("saturation shift", p.cleaningCase().saturationShift(), Dimension.TEMPERATURE_DIFFERENCE);
            t.row("extra compressor power", p.extraPower(), Dimension.HEAT_FLOW);
            out.println("  " + p.summary());
        });
        if (!d.warnings().isEmpty()) {
            t.section("Warnings");
            d.warnings().forEach(w -> out.println("  ! " + w));
        }
        t.section("Methods");
        for (Citation c : d.now().methods()) {
            out.println("  " + c.key() + " - " + c.reference());
        }
        out.println("  " + NormalCoverage.SOURCE.key() + " - " + NormalCoverage.SOURCE.reference());
        if (m.duty() == Duty.EVAPORATOR && m.airOutletRelativeHumidity() == null) {
            out.println("  (leaving humidity not measured: the sensible duty was matched)");
        }
    }

    private static void reading(PrintWriter out, UnitSystem u, String label, Reading r, Dimension d) {
        String acc = r.accuracy() > 0 ? "  ± " + Quantities.format(r.accuracy(),
                d == Dimension.TEMPERATURE ? Dimension.TEMPERATURE_DIFFERENCE : d, u) : "  (accuracy not stated)";
        out.printf(Locale.ROOT, "  %-26s %s%s%n", label, Quantities.format(r.value(), d, u), acc);
    }

    private static void deposit(PrintWriter out, UnitSystem u, String label, DepositLevel level) {
        String unit = u == UnitSystem.SI ? "mm" : "in";
        Estimate t = level.thickness();
        String blocked = level.blockedFraction().map(b -> String.format(Locale.ROOT, "; blocks %.1f %% (%.1f to %.1f %%) of"
                + " the free-flow area", 100 * b.value(), 100 * b.low(), 100 * b.high()))
                .orElse("; thicker than the passages hold (" + Quantities.format(level.maxThickness(), Dimension.LENGTH, u,
                        unit) + ")");
        out.printf(Locale.ROOT, "  %-26s %s   (%s to %s)%s%n", label, Quantities.format(t.value(), Dimension.LENGTH, u, unit),
                Quantities.format(t.low(), Dimension.LENGTH, u, unit), Quantities.format(t.high(), Dimension.LENGTH, u, unit),
                blocked);
    }

    private static void estimate(PrintWriter out, UnitSystem u, String label, Estimate e, Dimension d) {
        out.printf(Locale.ROOT, "  %-26s %s   (%s to %s)%n", label, Quantities.format(e.value(), d, u),
                Quantities.format(e.low(), d, u), Quantities.format(e.high(), d, u));
    }
}
