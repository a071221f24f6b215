package org.finstack.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.material.Material;

/**
 * Rates one case many times with one parameter changed: what a designer plots to see how
 * capacity and air pressure drop answer to fin density, rows, face velocity, tube wall, tube
 * material or dirt on the fins. A value that makes an impossible coil (fins thicker than their
 * pitch, say) gives a point with the reason instead of a rating, so one bad value never hides
 * the others.
 */
public final class Sweep {

    private Sweep() {
    }

    /** A parameter that can be swept over numbers. */
    public enum Parameter {
        /** Fin density [fins per metre]; the fin pitch is its reciprocal. */
        FIN_DENSITY,
        /** Number of rows [-] (whole numbers). */
        ROWS,
        /** Face velocity at the inlet state [m/s] (replaces a given volume flow). */
        FACE_VELOCITY,
        /** Tube wall thickness [m]. */
        TUBE_WALL,
        /** Air-side fouling resistance [m2 K/W]. */
        AIR_FOULING;

        /**
         * @param base  a case
         * @param value the parameter's value, in the unit given for the constant
         * @return the case with the parameter set to {@code value}
         */
        public CoilCase apply(CoilCase base, double value) {
            return switch (this) {
                case FIN_DENSITY -> base.withCoil(base.coil().withFinPitch(1 / positive("finDensity", value)));
                case ROWS -> base.withCoil(base.coil().withRows(whole("rows", value)));
                case FACE_VELOCITY -> new CoilCase(base.coil(), new AirInlet(base.air().temperature(),
                        positive("faceVelocity", value), 0, base.air().pressure(), base.air().relativeHumidity()),
                        base.refrigerant(), base.fouling());
                case TUBE_WALL -> base.withCoil(base.coil().withTubeWall(value));
                case AIR_FOULING -> base.withFouling(new FoulingResistances(value, base.fouling().inside(),
                        base.fouling().contact()));
            };
        }

        /**
         * @param c a case
         * @return the parameter's value in that case, in the unit given for the constant
         */
        public double valueIn(CoilCase c) {
            return switch (this) {
                case FIN_DENSITY -> 1 / c.coil().finPitch();
                case ROWS -> c.coil().rows();
                case FACE_VELOCITY -> c.air().faceVelocity() > 0 ? c.air().faceVelocity()
                        : c.air().volumeFlow() / c.coil().derive().faceArea();
                case TUBE_WALL -> c.coil().tubeWall();
                case AIR_FOULING -> c.fouling().airSide();
            };
        }

        private static double positive(String field, double v) {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new InputException(field, Msg.NOT_POSITIVE, v);
            }
            return v;
        }

        private static int whole(String field, double v) {
            if (v != Math.rint(v) || v < 1 || v > 1000) {
                throw new InputException(field, Msg.NOT_WHOLE, v);
            }
            return (int) v;
        }
    }

    /**
     * One point of a sweep: the value and its rating, or the reason there is none.
     *
     * @param value  the parameter's value (for a material sweep, the material's position)
     * @param label  the value as a label (the material id for a material sweep, else empty)
     * @param rating the rating, or null when the value gave an impossible case
     * @param error  why there is no rating, or null
     */
    public record Point(double value, String label, Rating rating, String error) {

        /** @return whether the point has a rating */
        public boolean rated() {
            return rating != null;
        }
    }

    /**
     * Sweeps a numeric parameter with the model the case names and no progress reports.
     *
     * @param base   the case to vary
     * @param p      the parameter
     * @param values its values, in the unit given for the parameter
     * @return one point per value, in order
     */
    public static List<Point> over(CoilCase base, Parameter p, double[] values) {
        return over(base, p, values, CoilModel.of(base), Progress.NONE);
    }

    /**
     * Sweeps a numeric parameter.
     *
     * @param base     the case to vary
     * @param p        the parameter
     * @param values   its values, in the unit given for the parameter
     * @param model    the rating model
     * @param progress progress sink, checked for cancellation between points
     * @return one point per value, in order
     * @throws CancellationException when the progress sink asks to stop
     */
    public static List<Point> over(CoilCase base, Parameter p, double[] values, CoilModel model, Progress progress) {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(p, "p");
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            stopIfCancelled(progress);
            double v = values[i];
            try {
                out.add(new Point(v, "", model.rate(p.apply(base, v)), null));
            } catch (FinstackException e) {
                out.add(new Point(v, "", null, e.getMessage()));
            }
            progress.step(i + 1, values.length);
        }
        return List.copyOf(out);
    }

    /**
     * Sweeps the tube material (a categorical parameter).
     *
     * @param base      the case to vary
     * @param materials the tube materials to try
     * @param model     the rating model
     * @param progress  progress sink, checked for cancellation between points
     * @return one point per material, in order, labelled with the material's id
     * @throws CancellationException when the progress sink asks to stop
     */
    public static List<Point> overTubeMaterials(CoilCase base, List<Material> materials, CoilModel model,
            Progress progress) {
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < materials.size(); i++) {
            stopIfCancelled(progress);
            Material m = materials.get(i);
            try {
                out.add(new Point(i, m.id(), model.rate(base.withCoil(base.coil().withTubeMaterial(m))), null));
            } catch (FinstackException e) {
                out.add(new Point(i, m.id(), null, e.getMessage()));
            }
            progress.step(i + 1, materials.size());
        }
        return List.copyOf(out);
    }

    /**
     * Evenly spaced values from {@code from} to {@code to}, both included.
     *
     * @param from  first value
     * @param to    last value
     * @param count number of values, at least 2
     * @return the values
     */
    public static double[] range(double from, double to, int count) {
        if (count < 2) {
            throw new InputException("count", Msg.NOT_ABOVE, (double) count, 1.0);
        }
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            v[i] = from + (to - from) * i / (count - 1);
        }
        return v;
    }

    private static void stopIfCancelled(Progress progress) {
        if (progress.cancelled()) {
            throw new CancellationException("sweep cancelled");
        }
    }
}
