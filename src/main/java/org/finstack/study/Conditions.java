package org.finstack.study;

import java.util.Objects;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.geometry.CoilGeometry;

/**
 * The operating conditions a project's options are rated at.
 *
 * @param air         the entering air
 * @param refrigerant the refrigerant side
 * @param fouling     added resistances (never null; {@link FoulingResistances#NONE} when clean)
 */
public record Conditions(AirInlet air, RefrigerantSide refrigerant, FoulingResistances fouling) {

    /** Checks the parts are present. */
    public Conditions {
        Objects.requireNonNull(air, "air");
        Objects.requireNonNull(refrigerant, "refrigerant");
        fouling = fouling == null ? FoulingResistances.NONE : fouling;
    }

    /**
     * @param c a case
     * @return the case's conditions
     */
    public static Conditions of(CoilCase c) {
        return new Conditions(c.air(), c.refrigerant(), c.fouling());
    }

    /**
     * @param coil a coil
     * @return the case of that coil at these conditions
     */
    public CoilCase caseFor(CoilGeometry coil) {
        return new CoilCase(coil, air, refrigerant, fouling);
    }

    /**
     * @param a other air
     * @return these conditions with other air
     */
    public Conditions withAir(AirInlet a) {
        return new Conditions(a, refrigerant, fouling);
    }

    /**
     * @param r another refrigerant side
     * @return these conditions with another refrigerant side
     */
    public Conditions withRefrigerant(RefrigerantSide r) {
        return new Conditions(air, r, fouling);
    }

    /** @return the rating model the refrigerant side names */
    public CoilModel model() {
        return new CoilModel(refrigerant.model());
    }

    /**
     * @param m a rating model
     * @return these conditions rated by that model (the refrigerant side otherwise unchanged)
     * @throws org.finstack.core.InputException when the refrigerant side lacks what the model needs
     */
    public Conditions withModel(CoilModel m) {
        return new Conditions(air, m.applyTo(refrigerant), fouling);
    }

    /**
     * @param f other added resistances
     * @return these conditions with other added resistances
     */
    public Conditions withFouling(FoulingResistances f) {
        return new Conditions(air, refrigerant, f);
    }
}
