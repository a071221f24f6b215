package org.finstack.exchanger;

import org.finstack.core.Citation;

/**
 * The fixed single-pass flow arrangements. "Mixed" means the fluid has one temperature across
 * the flow passage at each point along its path (no gradient normal to its flow); "unmixed" means
 * each stream tube keeps its own temperature. For a multi-row coil see {@link CounterCrossflow}.
 */
public enum FlowArrangement implements Arrangement {

    /** Pure counterflow. */
    COUNTERFLOW("counterflow", Refs.KAYS_LONDON, "counterflow"),

    /** Pure parallel flow (co-current). */
    PARALLEL_FLOW("parallel-flow", Refs.KAYS_LONDON, "parallel flow"),

    /** Single-pass crossflow, both fluids unmixed: Mason's exact series. */
    CROSSFLOW_BOTH_UNMIXED("crossflow-unmixed", Refs.MASON,
            "crossflow, both fluids unmixed (exact series)"),

    /**
     * Single-pass crossflow, both fluids unmixed: the usual closed-form approximation
     * eps = 1 - exp[(NTU^0.22 / Cr)(exp(-Cr NTU^0.78) - 1)]. Its error against the exact series
     * reaches 3.8 % for NTU &le; 5; for NTU below 0.5 it even falls below parallel flow (by up to
     * 3.2 %), because its leading correction goes as NTU^1.78 instead of NTU^2. Prefer
     * {@link #CROSSFLOW_BOTH_UNMIXED}; this form is kept for comparison with hand calculations.
     */
    CROSSFLOW_BOTH_UNMIXED_APPROX("crossflow-unmixed-approx", Refs.INCROPERA_DEWITT,
            "crossflow, both fluids unmixed (closed-form approximation)"),

    /** Single-pass crossflow, the fluid with the larger capacity rate mixed, the other unmixed. */
    CROSSFLOW_CMAX_MIXED("crossflow-cmax-mixed", Refs.KAYS_LONDON,
            "crossflow, Cmax fluid mixed, Cmin fluid unmixed"),

    /** Single-pass crossflow, the fluid with the smaller capacity rate mixed, the other unmixed. */
    CROSSFLOW_CMIN_MIXED("crossflow-cmin-mixed", Refs.KAYS_LONDON,
            "crossflow, Cmin fluid mixed, Cmax fluid unmixed");

    private final String id;
    private final Citation source;
    private final String description;

    FlowArrangement(String id, Citation source, String description) {
        this.id = id;
        this.source = source;
        this.description = description;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public Citation source() {
        return source;
    }

    @Override
    public String description() {
        return description;
    }
}
