package org.finstack.study.explain;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.finstack.coil.Rating;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.OptionResult;
import org.finstack.study.pressure.DesignPressureMargin;

/**
 * Plain-language sentences about a coil or a comparison, built only from computed results: a
 * rating's resistance shares, a {@link Sensitivity} and a {@link Comparison}. Percentages are
 * rounded to whole percent (one decimal below 10 %), and a share or step effect under 1 % is
 * said as "under 1 %", so a reader is not asked to trust digits the methods cannot carry. The same results
 * always give the same sentences.
 */
public final class Explanation {

    private Explanation() {
    }

    /**
     * Where the heat is held back, from a rating's series resistances.
     *
     * @param r a rating
     * @return one sentence
     */
    public static String resistances(Rating r) {
        Map<String, Double> s = r.resistances().shares();
        double air = s.get("airFilm") + s.get("fin");
        double dirt = s.get("airFouling") + s.get("coating");
        double metal = s.get("wall") + s.get("contact");
        double inside = s.get("insideFilm") + s.get("insideFouling");
        StringBuilder b = new StringBuilder("The air film and fins hold back ").append(share(air))
                .append(" of the heat on its way from air to refrigerant");
        if (dirt >= 0.005) {
            b.append(", dirt and coating on the fins ").append(share(dirt));
        }
        b.append(", the refrigerant film and any inside fouling ").append(share(inside))
                .append(", and the tube wall ").append(metal < 0.01 ? "under 1 %" : share(metal)).append('.');
        if (air >= 0.5) {
            b.append(" So the air side decides this coil's capacity: more or better fin surface pays, the tubes "
                    + "hardly matter.");
        } else if (inside >= 0.4) {
            b.append(" The refrigerant side holds back a large share: the circuiting and the refrigerant's "
                    + "velocity in the tubes matter as much as the fins.");
        }
        return b.toString();
    }

    /**
     * The trade-offs of one coil: where its heat is held back, which step moves it most, what the
     * tube wall and material buy, and what clean fins are worth.
     *
     * @param s a sensitivity result
     * @return the sentences, in reading order
     */
    public static List<String> forCoil(Sensitivity.Result s) {
        List<String> out = new ArrayList<>();
        out.add(resistances(s.baseRating()));
        Optional<Sensitivity.Effect> top = s.effects().stream().filter(Sensitivity.Effect::rated).findFirst();
        top.ifPresent(e -> out.add("Of the changes tried, " + e.step() + " moves capacity most: "
                + signed(e.capacityFraction()) + ", with the air pressure drop " + signed(e.airPressureDropFraction())
                + "."));
        Sensitivity.Effect fins = s.effect(Sensitivity.Input.FIN_DENSITY);
        Sensitivity.Effect rows = s.effect(Sensitivity.Input.ROWS);
        if (fins.rated() && rows.rated()) {
            out.add(capitalised(fins.step()) + " buys " + signed(fins.capacityFraction()) + " capacity for "
                    + signed(fins.airPressureDropFraction()) + " air pressure drop; " + rows.step() + " buys "
                    + signed(rows.capacityFraction()) + " for " + signed(rows.airPressureDropFraction()) + ".");
        }
        Sensitivity.Effect wall = s.effect(Sensitivity.Input.TUBE_WALL);
        Sensitivity.Effect tube = s.effect(Sensitivity.Input.TUBE_MATERIAL);
        if (wall.rated() && tube.rated()) {
            out.add(capitalised(wall.step()) + " changes capacity by " + size(wall.capacityFraction()) + ", and "
                    + tube.step() + " by " + size(tube.capacityFraction())
                    + ": choose the tube for strength, corrosion and cost, not for heat transfer.");
        }
        if (s.cleaning() != null && s.cleaning().rated()) {
            out.add("Cleaning the fins would recover " + size(s.cleaning().capacityFraction())
                    + " of capacity and lower the air pressure drop by "
                    + size(s.cleaning().airPressureDropFraction()) + ".");
        } else {
            Sensitivity.Effect dust = s.effect(Sensitivity.Input.AIR_FOULING);
            if (dust.rated()) {
                out.add("A light dust film on the fins would cost " + size(dust.capacityFraction())
                        + " of capacity: cleaning the fins keeps it.");
            }
        }
        return List.copyOf(out);
    }

    /**
     * The recommendation in one sentence.
     *
     * @param c a comparison
     * @return the sentence
     */
    public static String recommendation(Comparison c) {
        Optional<OptionResult> best = c.recommended();
        if (best.isEmpty()) {
            long candidates = c.options().stream().filter(o -> !o.existing()).count();
            if (candidates == 0) {
                return "There is no candidate to recommend: the project holds only the existing coil.";
            }
            return "None of the candidates passes every check (the project's limits, the required capacity, the "
                    + "fan and the design pressure); see the table and warnings before choosing.";
        }
        OptionResult o = best.get();
        StringBuilder b = new StringBuilder("Recommended: ").append(o.name());
        Optional<OptionResult> ex = c.existing();
        if (ex.isPresent()) {
            double ratio = o.deliveredCapacity() / ex.get().deliveredCapacity();
            b.append(", which carries ").append(moreOrLess(ratio - 1)).append(" than the existing coil")
                    .append(c.withFan() ? " on the project's fan" : " at the stated airflow");
        } else {
            b.append(", the candidate with the most capacity").append(c.withFan() ? " on the project's fan" : "");
        }
        b.append(", fits the project's limits");
        if (o.pressure() != null && o.pressure().known()) {
            b.append(" and has tubes rated at ").append(String.format(Locale.ROOT, "%.1f",
                    o.pressure().margin().margin())).append(" times the design pressure");
        }
        return b.append('.').toString();
    }

    /**
     * The main trade-offs between the candidates and the existing coil.
     *
     * @param c a comparison
     * @return the sentences, one or two per option, in the project's order
     */
    public static List<String> tradeOffs(Comparison c) {
        List<String> out = new ArrayList<>();
        Optional<OptionResult> ex = c.existing();
        for (OptionResult o : c.options()) {
            if (!o.rated()) {
                out.add(o.name() + " could not be rated: " + o.error());
                continue;
            }
            if (o.existing()) {
                continue;
            }
            if (ex.isPresent()) {
                OptionResult e = ex.get();
                String s = o.name() + " carries " + moreOrLess(o.rating().capacity() / e.rating().capacity() - 1)
                        + " than the existing coil at the stated airflow, with "
                        + moreOrLess(o.rating().airPressureDrop() / e.rating().airPressureDrop() - 1)
                        + " air pressure drop";
                if (c.withFan() && o.fan() != null && o.fan().found() && e.fan() != null && e.fan().found()) {
                    s += "; on the project's fan it gets " + moreOrLess(o.fan().airflow() / e.fan().airflow() - 1)
                            + " air than the existing coil and carries "
                            + moreOrLess(o.fan().capacity() / e.fan().capacity() - 1);
                }
                out.add(s + ".");
                if (o.chargeKg().isPresent() && e.chargeKg().isPresent() && e.chargeKg().getAsDouble() > 0) {
                    out.add(o.name() + " holds " + moreOrLess(o.chargeKg().getAsDouble() / e.chargeKg().getAsDouble() - 1)
                            + " refrigerant and weighs " + moreOrLess(o.rating().geometry().metalMass()
                                    / e.rating().geometry().metalMass() - 1) + " in metal.");
                } else {
                    out.add(o.name() + " weighs " + moreOrLess(o.rating().geometry().metalMass()
                            / e.rating().geometry().metalMass() - 1) + " in metal than the existing coil.");
                }
            }
            if (o.pressure() != null && o.pressure().known()
                    && o.pressure().margin().verdict() != DesignPressureMargin.Verdict.ADEQUATE) {
                out.add(o.name() + (o.pressure().margin().verdict() == DesignPressureMargin.Verdict.BELOW_REQUIRED
                        ? "'s tubes are rated below the design pressure: do not fit it without the maker's rating."
                        : "'s tubes clear the design pressure with little in hand: check the maker's rating."));
            }
            if (!o.constraintIssues().isEmpty()) {
                out.add(o.name() + " breaks " + o.constraintIssues().size() + " of the project's limits: "
                        + String.join(" ", o.constraintIssues()));
            }
        }
        return List.copyOf(out);
    }

    /**
     * @param fraction a share [-]
     * @return it as a percentage for reading ("73 %", "4.2 %", "under 1 %")
     */
    public static String share(double fraction) {
        double p = 100 * Math.abs(fraction);
        if (p < 1) {
            return "under 1 %";
        }
        return (p < 10 ? String.format(Locale.ROOT, "%.1f", p) : String.format(Locale.ROOT, "%.0f", p)) + " %";
    }

    private static String size(double fraction) {
        return share(fraction);
    }

    private static String signed(double fraction) {
        if (Math.abs(fraction) < 0.01) {
            return "under 1 %";
        }
        return (fraction > 0 ? "+" : "-") + share(fraction);
    }

    private static String moreOrLess(double fraction) {
        double p = 100 * Math.abs(fraction);
        String amount = p < 0.1 ? "under 0.1 %" : p < 10 ? String.format(Locale.ROOT, "%.1f %%", p)
                : String.format(Locale.ROOT, "%.0f %%", p);
        return amount + (fraction >= 0 ? " more" : " less");
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
