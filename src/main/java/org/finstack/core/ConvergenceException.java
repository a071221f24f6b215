package org.finstack.core;

/** A bounded iteration that ended without meeting its tolerance; names the quantity and the last residual. */
public class ConvergenceException extends FinstackException {

    private static final long serialVersionUID = 1L;

    /**
     * @param quantity   what was being solved for
     * @param iterations how many iterations were spent
     * @param residual   the last residual
     */
    public ConvergenceException(String quantity, int iterations, double residual) {
        super(Msg.NOT_CONVERGED, quantity, iterations, residual);
    }
}
