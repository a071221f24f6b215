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
            case TUBES -> new TubeCoilModel().rate(c);
        };
    }
}
