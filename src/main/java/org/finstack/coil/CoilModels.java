package org.finstack.coil;

import java.util.Locale;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;

/** Picks the rating model a case asks for. */
public final class CoilModels {

    private CoilModels() {
    }

    /**
     * Rates a case with the model its refrigerant side names.
     *
     * @param c the case
     * @return the rating
     */
    public static Rating rate(CoilCase c) {
        try {
            return switch (c.refrigerant().model()) {
                case ISOTHERMAL -> new IsothermalCoilModel().rate(c);
                case ZONES -> new ZoneCoilModel().rate(c);
                case TUBES -> new TubeCoilModel().rate(c);
            };
        } catch (InputException e) {
            throw airflowField(e, c.air());
        }
    }

    /**
     * A Reynolds number the air-side correlation cannot be evaluated at (an airflow of 1000 m/s,
     * or 0.001 m/s) is the airflow's fault: the refusal names the air field the case gave, not the
     * correlation's internal {@code reDc}.
     */
    private static InputException airflowField(InputException e, AirInlet air) {
        if (!"reDc".equals(e.field()) || e.msg() != Msg.OUT_OF_BOUNDS) {
            return e;
        }
        Object[] a = e.args();
        String field = air.faceVelocity() > 0 ? "air.faceVelocity" : "air.volumeFlow";
        return new InputException(field, Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                "gives an air Reynolds number of %s on the collar diameter, outside %s to %s where the air-side "
                        + "correlation can be evaluated at all: check the airflow and its unit",
                Numbers.brief((Double) a[0]), Numbers.brief((Double) a[1]), Numbers.brief((Double) a[2])));
    }
}
