package org.finstack.exchanger;

import java.util.regex.Pattern;
import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * Counter-crossflow through a coil of {@code rows} tube rows, one pass per row: the air crosses
 * the rows one after the other and is unmixed throughout; the tube fluid enters the row on the air
 * outlet side, runs through one row after the other towards the air inlet, has one temperature
 * across each row (mixed between rows) and reverses its direction along the tubes from row to row
 * (return bends, "inverted order" coupling), as ESDU 86018 assumes.
 *
 * <p>Which fluid has the smaller capacity rate matters for more than one row, so the arrangement
 * records it. For 1 to 4 rows {@link EpsilonNtu} uses the exact closed forms; beyond 4 rows it uses
 * pure counterflow, the limit of many passes (Pignotti &amp; Cordero 1983), which overstates the
 * effectiveness slightly (see {@link EpsilonNtu#effectiveness}).
 *
 * <p>Worked example: two rows, air C<sub>min</sub>, NTU = 2, C<sub>r</sub> = 0.5:
 * {@code EpsilonNtu.effectiveness(CounterCrossflow.rows(2, true), 2, 0.5)} = 0.752307.
 *
 * @param rows      number of tube rows in the air-flow direction, each one pass [-], at least 1
 * @param airIsCmin whether the air has the smaller capacity rate (the usual case for a
 *                  single-phase liquid coil); false when the tube fluid has it
 */
public record CounterCrossflow(int rows, boolean airIsCmin) implements Arrangement {

    /** The sources: ESDU 86018 for 1 to 4 rows. */
    public static final Citation SOURCE = Refs.ESDU_86018;

    /** Source of the many-rows (counterflow) limit used beyond {@link #MAX_EXACT_ROWS} rows. */
    public static final Citation COUNTERFLOW_LIMIT_SOURCE = Refs.PIGNOTTI_CORDERO;

    /** The largest number of rows with a published closed form (ESDU 86018 gives 1 to 4). */
    public static final int MAX_EXACT_ROWS = 4;

    /** Accepted id form; "row" is accepted for "rows". */
    static final Pattern ID = Pattern.compile("counter-crossflow-(\\d{1,6})-rows?-air-(cmin|cmax)");

    /**
     * Validates the number of rows.
     *
     * @param rows      number of tube rows [-], at least 1
     * @param airIsCmin whether the air has the smaller capacity rate
     */
    public CounterCrossflow {
        Check.atLeastOne("rows", rows);
    }

    /**
     * @param n         number of tube rows [-], at least 1
     * @param airIsCmin whether the air has the smaller capacity rate
     * @return the arrangement
     */
    public static CounterCrossflow rows(int n, boolean airIsCmin) {
        return new CounterCrossflow(n, airIsCmin);
    }

    /**
     * Chooses the C<sub>min</sub> side from the two capacity rates (air taken as C<sub>min</sub>
     * when they are equal, where both forms agree).
     *
     * @param n                number of tube rows [-], at least 1
     * @param airCapacityRate  air mass flow times specific heat [W/K]
     * @param tubeCapacityRate tube fluid mass flow times specific heat [W/K]
     * @return the arrangement
     */
    public static CounterCrossflow rows(int n, double airCapacityRate, double tubeCapacityRate) {
        Check.positive("airCapacityRate", airCapacityRate);
        Check.positive("tubeCapacityRate", tubeCapacityRate);
        return new CounterCrossflow(n, airCapacityRate <= tubeCapacityRate);
    }

    /** @return whether a published closed form covers this many rows (else the counterflow limit) */
    public boolean exact() {
        return rows <= MAX_EXACT_ROWS;
    }

    @Override
    public String id() {
        return "counter-crossflow-" + rows + "-rows-air-" + (airIsCmin ? "cmin" : "cmax");
    }

    @Override
    public Citation source() {
        return exact() ? SOURCE : COUNTERFLOW_LIMIT_SOURCE;
    }

    @Override
    public String description() {
        return "counter-crossflow, " + rows + (rows == 1 ? " row" : " rows")
                + ", tube fluid mixed between rows, air unmixed, "
                + (airIsCmin ? "air" : "tube fluid") + " has Cmin"
                + (exact() ? "" : " (counterflow limit)");
    }
}
