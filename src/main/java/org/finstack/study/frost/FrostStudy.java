package org.finstack.study.frost;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CancellationException;
import org.finstack.coil.CoilCase;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.study.Progress;
import org.finstack.study.fouling.CoilFan;
import org.finstack.study.fouling.DepositLayer;
import org.finstack.study.fouling.FanInLoop;
import org.finstack.study.fouling.FoulingLevel;

/**
 * Frost build-up on an evaporator, marched in time to the defrost interval.
 *
 * <p><b>Model.</b> At each time step the coil is rated with its fan in the loop
 * ({@link FanInLoop}); when the rating says the water freezes on the fins
 * ({@code Rating.moisture().frost()}), the water it removes from the air,
 * {@code moisture().condensate()} [kg/s], is added to the frost mass over the step (explicit
 * Euler). The frost is spread evenly over the clean air-side area A_o as a layer of thickness
 * delta = m / (rho_f A_o), of density rho_f from {@link Hayashi1977FrostDensity} and conductivity
 * k_f from {@link YonkoSepsy1967FrostConductivity}. The layer acts exactly as a dust deposit of
 * that thickness and conductivity ({@link FoulingLevel}): it narrows the air passages, raising the
 * pressure drop so that the fan delivers less air, and adds delta / k_f in series on the air
 * side.
 *
 * <p><b>Approximations of this program.</b> The frost surface temperature for the density is taken
 * as the mean of the refrigerant saturation temperature (the cold wall) and the entering air's
 * dew point (which the growing frost surface approaches), capped at 0 C, and held over the run;
 * below the density relation's range it is held at the range's lower end (-25 C) with a note, so
 * the density stays a measured one. The frost is uniform over the coil (real frost is thickest at
 * the air-entering rows) and does not densify with time; the layer's own density and the loss of
 * latent heat to the frost are those of the rating model.
 *
 * <p><b>Stop.</b> The march ends when the capacity or the airflow falls below
 * {@code threshold} times its clean value; the time is interpolated linearly within the step and
 * reported as the defrost interval. It also ends, with a note, when the layer reaches the
 * thickest one the passages allow ({@link DepositLayer#maxThickness}). At most {@link #MAX_STEPS}
 * steps.
 */
public final class FrostStudy {

    /** Most time steps of one march. */
    public static final int MAX_STEPS = 2000;

    /** Default share of the clean capacity or airflow at which the coil is due for defrost [-]; a choice. */
    public static final double DEFAULT_THRESHOLD = 0.7;

    private static final double KELVIN_AT_0C = 273.15; // exact by definition
    private static final double HOUR = 3600; // s

    private FrostStudy() {
    }

    /**
     * @param clean     the case with a clean coil (its airflow is the fan's starting guess)
     * @param fan       the fan, or {@code null} to hold the airflow (the loss is then understated)
     * @param hours     time to march [h], up to 1000
     * @param steps     number of equal time steps, 1 to {@link #MAX_STEPS}
     * @param threshold share of the clean capacity or airflow at which defrost is due [-], in (0, 1)
     * @return the timeline and the defrost interval
     */
    public static FrostResult march(CoilCase clean, CoilFan fan, double hours, int steps, double threshold) {
        return march(clean, fan, hours, steps, threshold, Progress.NONE);
    }

    /**
     * The march, reporting each time step done and stopping between steps when asked.
     *
     * @param clean     the case with a clean coil (its airflow is the fan's starting guess)
     * @param fan       the fan, or {@code null} to hold the airflow (the loss is then understated)
     * @param hours     time to march [h], up to 1000
     * @param steps     number of equal time steps, 1 to {@link #MAX_STEPS}
     * @param threshold share of the clean capacity or airflow at which defrost is due [-], in (0, 1)
     * @param progress  hears of each step done; checked for cancellation before each step
     * @return the timeline and the defrost interval
     * @throws CancellationException when {@code progress} asks to stop
     */
    public static FrostResult march(CoilCase clean, CoilFan fan, double hours, int steps, double threshold,
            Progress progress) {
        Check.positive("hours", hours);
        Check.within("hours", hours, 0, 1000);
        if (steps < 1 || steps > MAX_STEPS) {
            throw new InputException("steps", Msg.OUT_OF_BOUNDS, (double) steps, 1.0, (double) MAX_STEPS);
        }
        Check.positive("threshold", threshold);
        if (threshold >= 1) {
            throw new InputException("threshold", Msg.NOT_BELOW, threshold, 1.0);
        }
        Set<String> warnings = new LinkedHashSet<>();
        List<String> notes = new ArrayList<>();
        notes.add(fan == null ? FanInLoop.HELD_CONSTANT
                : "airflow from the " + fan.describe() + " against the frosted coil's pressure drop at each step");
        FanInLoop.LoopRating first = FanInLoop.rate(clean, fan, 0);
        warnings.addAll(first.warnings());
        List<FrostPoint> timeline = new ArrayList<>();
        timeline.add(new FrostPoint(0, 0, 0, first.flow(), first.rating().capacity(), first.airPressureDrop(),
                first.fanPower()));
        if (!first.rating().moisture().frost()) {
            notes.add("no frost grows: the coil's surface runs above 0 C, or the air is too dry to deposit water on it");
            return new FrostResult(false, Double.NaN, Double.NaN, Double.NaN, timeline, Double.NaN, notes,
                    new ArrayList<>(warnings));
        }
        Warnings w = new Warnings();
        double ts = surfaceTemperature(clean);
        double lower = Hayashi1977FrostDensity.VALIDITY.limit("Ts").min() + KELVIN_AT_0C;
        if (ts < lower) {
            notes.add(String.format(Locale.ROOT, "estimated frost surface temperature %s C lies below the range of %s;"
                    + " the density is taken at %s C", Numbers.brief(ts - KELVIN_AT_0C),
                    Hayashi1977FrostDensity.SOURCE.key(), Numbers.brief(lower - KELVIN_AT_0C)));
            ts = lower;
        }
        double rho = Hayashi1977FrostDensity.density(ts, w);
        double k = YonkoSepsy1967FrostConductivity.conductivity(rho, w);
        warnings.addAll(w.list());
        double area = clean.coil().derive().airSideArea();
        double maxThickness = DepositLayer.maxThickness(clean.coil());
        double dt = hours / steps;
        double mass = 0;
        double interval = Double.NaN;
        FanInLoop.LoopRating now = first;
        for (int i = 1; i <= steps; i++) {
            if (progress.cancelled()) {
                throw new CancellationException("frost march cancelled");
            }
            progress.step(i - 1, steps);
            double growth = now.rating().moisture().frost() ? now.rating().moisture().condensate() : 0;
            mass += growth * dt * HOUR;
            double delta = mass / (rho * area);
            double time = i * dt;
            if (delta > maxThickness) {
                notes.add(String.format(Locale.ROOT, "at %s h the frost layer would exceed %s mm, nearly closing the"
                        + " passages: the march stops there", Numbers.brief(time), Numbers.brief(maxThickness * 1e3)));
                if (Double.isNaN(interval)) {
                    interval = time;
                }
                break;
            }
            FoulingLevel.FoulingCase fc = new FoulingLevel(delta, k).applyTo(clean);
            now = FanInLoop.rate(fc.hydraulic(), fc.thermal(), fan, now.flow());
            warnings.addAll(now.warnings());
            FrostPoint p = new FrostPoint(time, mass, delta, now.flow(), now.rating().capacity(), now.airPressureDrop(),
                    now.fanPower());
            FrostPoint prev = timeline.get(timeline.size() - 1);
            timeline.add(p);
            double capRatio = p.capacity() / first.rating().capacity();
            double flowRatio = p.airflow() / first.flow();
            if (capRatio < threshold || flowRatio < threshold) {
                double prevRatio = Math.min(prev.capacity() / first.rating().capacity(), prev.airflow() / first.flow());
                double ratio = Math.min(capRatio, flowRatio);
                double share = prevRatio == ratio ? 1 : (prevRatio - threshold) / (prevRatio - ratio);
                interval = prev.time() + Math.max(0, Math.min(1, share)) * (time - prev.time());
                notes.add(String.format(Locale.ROOT, "defrost due at %s h: %s fell below %s %% of clean",
                        Numbers.brief(interval), capRatio < threshold ? "capacity" : "airflow",
                        Numbers.brief(100 * threshold)));
                break;
            }
        }
        return new FrostResult(true, ts, rho, k, timeline, interval, notes, new ArrayList<>(warnings));
    }

    /**
     * The frost surface temperature this study uses: the mean of the refrigerant saturation
     * temperature and the entering air's dew point, capped at 0 C.
     *
     * @param c the case
     * @return [K]
     */
    public static double surfaceTemperature(CoilCase c) {
        MoistAirState in = MoistAirState.fromRelativeHumidity(c.air().temperature(), c.air().relativeHumidity(),
                c.air().pressure());
        double dew = in.dewPoint();
        return Math.min(KELVIN_AT_0C, 0.5 * (c.refrigerant().saturationTemperature() + dew));
    }

    /**
     * One instant of the march.
     *
     * @param time            [h]
     * @param frostMass       frost on the coil [kg]
     * @param frostThickness  layer thickness on each surface [m]
     * @param airflow         operating volume flow [m3/s]
     * @param capacity        [W]
     * @param airPressureDrop [Pa]
     * @param fanPower        fan electrical power [W], NaN when unknown
     */
    public record FrostPoint(double time, double frostMass, double frostThickness, double airflow, double capacity,
            double airPressureDrop, double fanPower) {
    }

    /**
     * A frost march.
     *
     * @param frosting           whether the coil frosts at all
     * @param surfaceTemperature frost surface temperature used for the density [K] (NaN without frost)
     * @param density            frost density [kg/m3] (NaN without frost)
     * @param conductivity       frost conductivity [W/(m K)] (NaN without frost)
     * @param timeline           from the clean coil on
     * @param defrostInterval    time at which the threshold is crossed [h], NaN if not reached
     * @param notes              how the result was reached
     * @param warnings           warnings, each once
     */
    public record FrostResult(boolean frosting, double surfaceTemperature, double density, double conductivity,
            List<FrostPoint> timeline, double defrostInterval, List<String> notes, List<String> warnings) {

        /** Copies the lists. */
        public FrostResult {
            timeline = List.copyOf(timeline);
            notes = List.copyOf(notes);
            warnings = List.copyOf(warnings);
        }
    }
}
