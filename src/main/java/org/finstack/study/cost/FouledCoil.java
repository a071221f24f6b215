package org.finstack.study.cost;

/** Which coil is dirty, and so which saturation temperature moves. */
public enum FouledCoil {
    /** A dirty condenser: the condensing temperature rises. */
    CONDENSER("condenser"),
    /** A dirty evaporator: the evaporating temperature falls. */
    EVAPORATOR("evaporator");

    private final String noun;

    FouledCoil(String noun) {
        this.noun = noun;
    }

    /** @return the coil's name in a sentence, e.g. "condenser" */
    public String noun() {
        return noun;
    }
}
