package org.finstack.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.finstack.coil.AirInlet;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.Citation;
import org.finstack.fluid.Fluids;
import org.finstack.study.Cautions;
import org.finstack.study.Project;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.OptionResult;
import org.finstack.study.explain.Explanation;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * Everything the one-page summary says, as text in the chosen unit system: built once from a
 * comparison, then laid out by {@link PdfReport} or {@link HtmlReport}.
 *
 * @param title          the project's name
 * @param question       what the page answers
 * @param recommendation the recommendation in one sentence
 * @param header         the comparison table's column heads
 * @param rows           the table's rows, one per option, cells as text
 * @param chart          the chart's data
 * @param tradeOffs      the main trade-offs in words
 * @param assumptions    the conditions and assumptions
 * @param methods        the methods used, "key - reference"
 * @param cautions       the cautions for the refrigerant
 * @param disclaimer     the statement that local codes and licensed practice govern
 */
public record Summary(String title, String question, String recommendation, List<String> header,
        List<List<String>> rows, ChartData chart, List<String> tradeOffs, List<String> assumptions,
        List<String> methods, List<String> cautions, String disclaimer) {

    /** Head of the capacity-band column. */
    static final String BAND = "Capacity p10 - p90";

    /** Start of the assumption that explains the band. */
    static final String BAND_NOTE = "Capacity band:";

    /** Freezes the lists. */
    public Summary {
        header = List.copyOf(header);
        rows = rows.stream().map(List::copyOf).toList();
        tradeOffs = List.copyOf(tradeOffs);
        assumptions = List.copyOf(assumptions);
        methods = List.copyOf(methods);
        cautions = List.copyOf(cautions);
    }

    /**
     * The chart's data: one entry per rated option.
     *
     * @param labels        short labels ("#1", "#2", ...)
     * @param capacity      capacity at the delivered airflow, in the capacity unit
     * @param capacityUnit  that unit
     * @param pressureDrop  air pressure drop at the delivered airflow, in the pressure unit
     * @param pressureUnit  that unit
     */
    public record ChartData(List<String> labels, List<Double> capacity, String capacityUnit,
            List<Double> pressureDrop, String pressureUnit) {

        /** Freezes the lists. */
        public ChartData {
            labels = List.copyOf(labels);
            capacity = List.copyOf(capacity);
            pressureDrop = List.copyOf(pressureDrop);
        }
    }

    /**
     * Builds the summary of a comparison.
     *
     * @param c     the comparison
     * @param units the unit system to write in
     * @return the summary
     */
    public static Summary of(Comparison c, UnitSystem units) {
        Objects.requireNonNull(c, "c");
        Objects.requireNonNull(units, "units");
        Project p = c.project();
        boolean fan = c.withFan();
        String existingName = p.existing() == null ? null : p.existing().name();
        String question = existingName == null
                ? "Which of " + p.options().size() + " candidate coils should be installed?"
                : "Which coil should replace " + existingName + ", and what does each candidate change?";
        boolean band = c.withBand();
        List<String> header = new ArrayList<>(List.of("#", "Option", "Capacity"));
        if (band) {
            header.add(BAND);
        }
        header.addAll(List.of("vs existing", "Air dp", fan ? "Airflow (fan)" : "Airflow",
                fan ? "Capacity on fan" : "Capacity", "Refr. dp", "Charge", "Metal mass", "Pressure margin"));
        List<List<String>> rows = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        List<Double> cap = new ArrayList<>();
        List<Double> dp = new ArrayList<>();
        String capUnit = Quantities.defaultUnit(Dimension.HEAT_FLOW, units);
        String dpUnit = Quantities.defaultUnit(Dimension.PRESSURE_DIFFERENCE, units);
        for (OptionResult o : c.options()) {
            String label = "#" + (o.index() + 1);
            String name = o.name() + (o.existing() ? " (existing)" : "");
            if (!o.rated()) {
                List<String> failed = new ArrayList<>(List.of(label, name, "not rated: " + o.error()));
                while (failed.size() < header.size()) {
                    failed.add("");
                }
                rows.add(failed);
                continue;
            }
            List<String> row = new ArrayList<>(List.of(label, name,
                    Format.q(o.rating().capacity(), Dimension.HEAT_FLOW, units)));
            if (band) {
                row.add(o.band() == null ? "-" : Format.q(o.band().capacityP10(), Dimension.HEAT_FLOW, units) + " - "
                        + Format.q(o.band().capacityP90(), Dimension.HEAT_FLOW, units));
            }
            row.addAll(List.of(o.capacityRatio().isPresent() ? Format.ratio(o.capacityRatio().getAsDouble()) : "-",
                    Format.q(o.deliveredAirPressureDrop(), Dimension.PRESSURE_DIFFERENCE, units),
                    Format.q(o.airflow(), Dimension.VOLUME_FLOW, units),
                    fan && (o.fan() == null || !o.fan().found()) ? "no fan point"
                            : Format.q(o.deliveredCapacity(), Dimension.HEAT_FLOW, units),
                    o.refrigerantPressureDrop().isPresent()
                            ? Format.q(o.refrigerantPressureDrop().getAsDouble(), Dimension.PRESSURE_DIFFERENCE, units)
                            : "not computed",
                    o.chargeKg().isPresent() ? Format.q(o.chargeKg().getAsDouble(), Dimension.MASS, units)
                            : "not computed",
                    Format.q(o.rating().geometry().metalMass(), Dimension.MASS, units),
                    o.pressureMargin().isPresent() ? Format.ratio(o.pressureMargin().getAsDouble()) + " "
                            + o.pressure().margin().verdict().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                            : "unknown"));
            rows.add(row);
            labels.add(label);
            cap.add(Quantities.toUnit(o.deliveredCapacity(), Dimension.HEAT_FLOW, capUnit));
            dp.add(Quantities.toUnit(o.deliveredAirPressureDrop(), Dimension.PRESSURE_DIFFERENCE, dpUnit));
        }
        List<String> trade = new ArrayList<>(Explanation.tradeOffs(c));
        c.options().stream().filter(OptionResult::rated).findFirst()
                .ifPresent(o -> trade.add(0, firstName(o) + Explanation.resistances(o.rating())));
        return new Summary(p.name(), question, Explanation.recommendation(c), header, rows,
                new ChartData(labels, cap, capUnit, dp, dpUnit), trade, assumptions(c, units), methods(c),
                cautions(c), Cautions.GOVERNING);
    }

    /** @return whether the table has the capacity-band column */
    public boolean hasBand() {
        return header.contains(BAND);
    }

    /**
     * @return this summary without the capacity-band column and its assumption (for a page the
     *         band does not fit on)
     */
    public Summary withoutBand() {
        int k = header.indexOf(BAND);
        if (k < 0) {
            return this;
        }
        List<String> h = new ArrayList<>(header);
        h.remove(k);
        List<List<String>> r = new ArrayList<>();
        for (List<String> row : rows) {
            List<String> copy = new ArrayList<>(row);
            copy.remove(k);
            r.add(copy);
        }
        List<String> a = assumptions.stream().filter(x -> !x.startsWith(BAND_NOTE)).toList();
        return new Summary(title, question, recommendation, h, r, chart, tradeOffs, a, methods, cautions, disclaimer);
    }

    private static String firstName(OptionResult o) {
        return "In " + o.name() + ": ";
    }

    private static List<String> assumptions(Comparison c, UnitSystem u) {
        Project p = c.project();
        AirInlet a = p.conditions().air();
        RefrigerantSide r = p.conditions().refrigerant();
        List<String> out = new ArrayList<>();
        out.add("Air in: " + Format.q(a.temperature(), Dimension.TEMPERATURE, u) + ", "
                + String.format(Locale.ROOT, "%.0f", 100 * a.relativeHumidity()) + " % relative humidity, "
                + (a.faceVelocity() > 0 ? "face velocity " + Format.q(a.faceVelocity(), Dimension.VELOCITY, u)
                        : "airflow " + Format.q(a.volumeFlow(), Dimension.VOLUME_FLOW, u))
                + ", barometric " + Format.q(a.pressure(), Dimension.PRESSURE, u) + ".");
        out.add("Refrigerant: " + r.fluid() + " " + r.duty().id() + ", saturation "
                + Format.q(r.saturationTemperature(), Dimension.TEMPERATURE, u) + " (" + r.model().id() + " model)"
                + (p.conditions().fouling().airSide() > 0 ? "; air-side fouling "
                        + Format.q(p.conditions().fouling().airSide(), Dimension.FOULING_RESISTANCE, u) : "") + ".");
        if (c.withFan()) {
            out.add("Airflow on the fan: where the project's fan curve meets each coil's air pressure drop; ducting, "
                    + "filters and grilles are not counted. The chart shows capacity and air pressure drop there.");
        }
        out.add("Design pressure: saturation pressure at " + Format.q(c.basis().designTemperature(),
                Dimension.TEMPERATURE, u) + " (" + c.basis().description() + ") less ambient; tubes rated by the "
                + "ASME B31.5 straight-pipe rule, annealed, nominal wall. Margin bands: below 1 below required, "
                + "1 to " + DesignPressureCheck.ADEQUATE_FROM + " caution (Finstack's screening choice).");
        out.add("Charge: refrigerant held in the coil's tubes only; the system holds more.");
        c.options().stream().filter(o -> o.charge() != null).flatMap(o -> o.charge().notes().stream()).distinct()
                .forEach(out::add);
        c.options().stream().filter(o -> o.band() != null).findFirst().ifPresent(o -> out.add(BAND_NOTE
                + " 10th to 90th percentile of capacity at the stated airflow, a seeded Monte Carlo over the air-side "
                + "correlation's published scatter (" + o.band().samples() + " samples, seed " + o.band().seed()
                + "); the inputs are taken as exact."));
        out.add("Each option is rated alone with the same model and conditions a single rating uses.");
        return out;
    }

    private static List<String> methods(Comparison c) {
        Map<String, Citation> all = new LinkedHashMap<>();
        for (OptionResult o : c.options()) {
            if (o.rated()) {
                o.rating().methods().forEach(m -> all.putIfAbsent(m.key(), m));
                if (o.pressure() != null && o.pressure().known()) {
                    all.putIfAbsent(o.pressure().tube().method().key(), o.pressure().tube().method());
                    all.putIfAbsent(o.pressure().tube().stressSource().key(), o.pressure().tube().stressSource());
                    all.putIfAbsent(DesignPressureCheck.SOURCE.key(), DesignPressureCheck.SOURCE);
                }
            }
        }
        all.putIfAbsent(c.basis().source().key(), c.basis().source());
        return all.values().stream().map(m -> m.key() + " - " + m.reference()).toList();
    }

    private static List<String> cautions(Comparison c) {
        List<String> out = new ArrayList<>(Cautions.forFluid(Fluids.byName(c.project().conditions().refrigerant()
                .fluid())));
        out.remove(Cautions.GOVERNING);
        return out;
    }
}
