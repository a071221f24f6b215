package org.finstack.study.compare;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.concurrent.CancellationException;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.FinstackException;
import org.finstack.core.Numbers;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.SaturationState;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Constraints;
import org.finstack.study.Constraints.Room;
import org.finstack.study.Option;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.pressure.ChargeScreening;
import org.finstack.study.pressure.ChargeScreeningResult;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.study.pressure.DesignPressureMargin;
import org.finstack.study.pressure.En378Part1AnnexC;
import org.finstack.study.pressure.PressureRating;
import org.finstack.study.pressure.RefrigerantSafety;
import org.finstack.study.pressure.RefrigerantSafetyTable;
import org.finstack.study.pressure.TubePressureRating;
import org.finstack.study.uncertainty.UncertaintyBand;

/**
 * A project's coils side by side. Each option is rated at the project's conditions (with its own
 * overrides) by the model its case names, {@link CoilModels#rate} — the same call a single rating
 * makes, so a comparison always agrees with rating each coil alone. Beside each rating:
 * <ul>
 * <li>the capacity over the existing coil's;</li>
 * <li>with a fan curve in the project's constraints, the airflow the fan delivers through the
 *     coil and the capacity there ({@link FanMatch});</li>
 * <li>the design-pressure margin: the tubes' allowable pressure by the ASME B31.5 straight-pipe
 *     rule with the allowable stresses of {@code study.pressure} (each stress names its source
 *     there), over the refrigerant's bubble-point pressure at the design temperature of the
 *     {@link DesignBasis} less ambient ({@link DesignPressureCheck}); the tube metal is taken at
 *     that same temperature;</li>
 * <li>the charge in the coil's tubes (full models only) and, for a flammable or higher-toxicity
 *     refrigerant, the EN 378-1 Annex C screen against the room when one is given
 *     ({@link ChargeScreening});</li>
 * <li>the project's limits the coil breaks: face width, face height, depth, circuits, required
 *     capacity;</li>
 * <li>when asked for ({@link BandSettings}), the capacity band (10th to 90th percentile) of the
 *     rated case at its stated airflow ({@link UncertaintyBand}).</li>
 * </ul>
 * An option that cannot be rated (an impossible combination, a solver that does not converge)
 * carries its reason, and so does an entry of the project file that could not be read
 * ({@link Project.Damaged}); the others still compare. Results follow the file's order.
 *
 * @param project the project compared
 * @param basis   the design-pressure and charge basis
 * @param options one result per option, existing coil first, in the project's order
 */
public record Comparison(Project project, DesignBasis basis, List<OptionResult> options) {

    /** Validates and freezes. */
    public Comparison {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(basis, "basis");
        options = List.copyOf(options);
    }

    /**
     * Compares a project's options on the default basis ({@link DesignBasis#defaultFor}) with the
     * project's room, without capacity bands.
     *
     * @param project the project
     * @return the comparison
     */
    public static Comparison of(Project project) {
        return of(project, DesignBasis.defaultFor(project.conditions()));
    }

    /**
     * Compares a project's options without capacity bands.
     *
     * @param project the project
     * @param basis   the design-pressure and charge basis (its room, when it has none, is the project's)
     * @return the comparison
     */
    public static Comparison of(Project project, DesignBasis basis) {
        return of(project, basis, BandSettings.OFF, Progress.NONE);
    }

    /**
     * Compares a project's entries in the file's order ({@link Project#entries()}): each readable
     * option is rated, a damaged entry carries its error (field and reason), the capacity band of
     * each rated option is added when asked for.
     *
     * @param project  the project
     * @param basis    the design-pressure and charge basis; without a room of its own, the
     *                 project's room ({@code constraints.room}) is used for the charge screen
     * @param band     whether and how to rate the capacity bands
     * @param progress told after each option; asked between options whether to stop
     * @return the comparison
     * @throws java.util.concurrent.CancellationException when {@code progress} asked to stop
     */
    public static Comparison of(Project project, DesignBasis basis, BandSettings band, Progress progress) {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(band, "band");
        Objects.requireNonNull(progress, "progress");
        if (basis.room() == null && project.constraints().room() != null) {
            basis = basis.withRoom(project.constraints().room());
        }
        List<Option> all = project.allOptions();
        FanCurve fan = null;
        String fanError = null;
        if (!project.constraints().fanCurve().isEmpty()) {
            try {
                fan = FanMatch.curve(project.constraints().fanCurve());
            } catch (FinstackException e) {
                fanError = e.getMessage();
            }
        }
        OptionalDouble existingCapacity = OptionalDouble.empty();
        List<OptionResult> out = new ArrayList<>();
        List<Project.Entry> entries = project.entries();
        for (int place = 0; place < entries.size(); place++) {
            if (progress.cancelled()) {
                throw new CancellationException("comparison stopped");
            }
            Project.Entry entry = entries.get(place);
            if (!entry.readable()) {
                Project.Damaged d = entry.damaged();
                out.add(OptionResult.failed(place, d.name(), d.existing(), d.error()));
                progress.step(place + 1, entries.size());
                continue;
            }
            int i = entry.option();
            Option o = all.get(i);
            boolean existing = project.isExisting(i);
            CoilCase c = project.caseOf(i);
            Rating r;
            try {
                r = CoilModels.rate(c);
            } catch (FinstackException e) {
                out.add(new OptionResult(place, o.name(), existing, c, null, e.getMessage(), OptionalDouble.empty(),
                        null, null, null, List.of(), null, null));
                progress.step(place + 1, entries.size());
                continue;
            }
            if (existing) {
                existingCapacity = OptionalDouble.of(r.capacity());
            }
            OptionalDouble ratio = existingCapacity.isPresent() && existingCapacity.getAsDouble() > 0
                    ? OptionalDouble.of(r.capacity() / existingCapacity.getAsDouble()) : OptionalDouble.empty();
            FanResult fr = fan != null ? FanMatch.match(c, r, fan)
                    : fanError != null ? new FanResult(null, 0, 0, fanError) : null;
            UncertaintyBand b = null;
            String bandNote = null;
            if (band.on()) {
                try {
                    b = UncertaintyBand.of(c, band.samples(), band.seed());
                } catch (FinstackException e) {
                    bandNote = e.getMessage();
                }
            }
            out.add(new OptionResult(place, o.name(), existing, c, r, null, ratio, fr, pressure(c, basis),
                    charge(c, r, basis), constraintIssues(c.coil(), fr != null && fr.found() ? fr.capacity()
                            : r.capacity(), project.constraints()), b, bandNote));
            progress.step(place + 1, entries.size());
        }
        return new Comparison(project, basis, out);
    }

    /** @return whether capacity bands were rated (at least one option has one) */
    public boolean withBand() {
        return options.stream().anyMatch(o -> o.band() != null);
    }

    /** @return the existing coil's result, if the project has one and it was rated */
    public Optional<OptionResult> existing() {
        return options.stream().filter(o -> o.existing() && o.rated()).findFirst();
    }

    /** @return whether a fan curve was given, so airflows are the fan's delivered airflows */
    public boolean withFan() {
        return !project.constraints().fanCurve().isEmpty();
    }

    /**
     * The candidate to recommend: among the rated candidates (not the existing coil) that break
     * none of the project's limits, reach the required capacity (at the fan's airflow when there is
     * a fan curve) and whose design-pressure margin is not below the required pressure, the one
     * with the most capacity at its delivered airflow.
     *
     * @return the candidate, or empty when none passes every check
     */
    public Optional<OptionResult> recommended() {
        return options.stream().filter(o -> !o.existing() && o.rated()).filter(o -> o.constraintIssues().isEmpty())
                .filter(o -> o.pressure() == null || !o.pressure().known()
                        || o.pressure().margin().verdict() != DesignPressureMargin.Verdict.BELOW_REQUIRED)
                .filter(o -> o.fan() == null || o.fan().found())
                .max(Comparator.comparingDouble(OptionResult::deliveredCapacity));
    }

    static PressureResult pressure(CoilCase c, DesignBasis basis) {
        double t = basis.designTemperature();
        CoilGeometry g = c.coil();
        try {
            Fluid fluid = Fluids.byName(c.refrigerant().fluid());
            if (t >= fluid.info().criticalTemperature()) {
                return new PressureResult(t, 0, null, null, String.format(Locale.ROOT,
                        "the design temperature %s K is above %s's critical temperature %s K; state the gas-cooler "
                                + "design pressure instead", Numbers.brief(t), fluid.info().name(),
                        Numbers.brief(fluid.info().criticalTemperature())));
            }
            SaturationState sat = fluid.saturationAtTemperature(t);
            double psat = Math.max(sat.bubblePressure(), sat.dewPressure());
            PressureRating tube = TubePressureRating.allowablePressure(g.tubeMaterial().id(), g.tubeOuterDiameter(),
                    g.tubeWall(), t);
            DesignPressureMargin m = DesignPressureCheck.margin(tube.allowableGauge(), psat, basis.ambientPressure());
            return new PressureResult(t, psat, tube, m, null);
        } catch (FinstackException e) {
            return new PressureResult(t, 0, null, null, e.getMessage());
        }
    }

    static ChargeResult charge(CoilCase c, Rating r, DesignBasis basis) {
        List<String> notes = new ArrayList<>();
        boolean computed = r.refrigerant() != null;
        double kg = computed ? r.refrigerant().charge() : 0;
        if (!computed) {
            notes.add("Charge not computed: the " + r.model() + " model does not follow the refrigerant through "
                    + "the tubes; rate with the zones model for the charge.");
        }
        RefrigerantSafety safety;
        try {
            String name = Fluids.byName(c.refrigerant().fluid()).info().name();
            safety = RefrigerantSafetyTable.standard().find("refrigerant.fluid", name);
        } catch (FinstackException e) {
            notes.add("No safety data for " + c.refrigerant().fluid() + ": charge not screened.");
            return new ChargeResult(computed, kg, null, null, notes);
        }
        boolean needsScreen = safety.safetyClass().flammable() || safety.safetyClass().higherToxicity();
        if (!needsScreen) {
            return new ChargeResult(computed, kg, safety, null, notes);
        }
        ChargeScreeningResult screening = null;
        if (computed && basis.room() != null && kg > 0) {
            Room room = basis.room();
            screening = ChargeScreening.screen(safety, room.volume(), room.floorArea(), room.releaseHeight(), kg,
                    room.selfContainedAppliance());
        } else if (computed) {
            String what = safety.designation() + " is class " + safety.safetyClass() + ": no room was given, so the "
                    + "charge is not screened against a room";
            if (safety.lfl().isPresent()) {
                double m1 = En378Part1AnnexC.m1(safety.lfl().getAsDouble());
                what += String.format(Locale.ROOT, "; the coil alone holds %s kg against m1 = %s kg (4 m3 x LFL), "
                        + "below which EN 378-1 sets no room size for flammability", Numbers.brief(kg), Numbers.brief(m1));
            }
            notes.add(what + ". The system holds more than the coil.");
        }
        return new ChargeResult(computed, kg, safety, screening, notes);
    }

    static List<String> constraintIssues(CoilGeometry g, double capacity, Constraints k) {
        List<String> issues = new ArrayList<>();
        double height = g.tubesPerRow() * g.transversePitch();
        double depth = g.rows() * g.rowPitch();
        if (k.maxFaceWidth() > 0 && g.finnedLength() > k.maxFaceWidth()) {
            issues.add(String.format(Locale.ROOT, "Finned length %s m is more than the opening's %s m.",
                    Numbers.brief(g.finnedLength()), Numbers.brief(k.maxFaceWidth())));
        }
        if (k.maxFaceHeight() > 0 && height > k.maxFaceHeight()) {
            issues.add(String.format(Locale.ROOT, "Face height %s m (tubes per row x transverse pitch) is more than "
                    + "the opening's %s m.", Numbers.brief(height), Numbers.brief(k.maxFaceHeight())));
        }
        if (k.maxDepth() > 0 && depth > k.maxDepth()) {
            issues.add(String.format(Locale.ROOT, "Depth %s m (rows x row pitch) is more than the %s m available.",
                    Numbers.brief(depth), Numbers.brief(k.maxDepth())));
        }
        if (k.circuits() > 0 && g.circuits() != k.circuits()) {
            issues.add("The coil has " + g.circuits() + " circuits; the distributor feeds " + k.circuits() + ".");
        }
        if (k.requiredCapacity() > 0 && capacity < k.requiredCapacity()) {
            issues.add(String.format(Locale.ROOT, "Capacity %s W is below the required %s W.",
                    Numbers.brief(capacity), Numbers.brief(k.requiredCapacity())));
        }
        return issues;
    }
}
