package org.finstack.coil;

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
        return switch (c.refrigerant().model()) {
            case ISOTHERMAL -> new IsothermalCoilModel().rate(c);
            case ZONES -> new ZoneCoilModel().rate(c);
            case TUBES -> throw new org.finstack.core.InputException("refrigerant.model",
                    org.finstack.core.Msg.IMPOSSIBLE, "the tube-by-tube model is not in this build");
        };
    }
}
