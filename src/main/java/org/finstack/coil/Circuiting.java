package org.finstack.coil;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The order in which the refrigerant passes through the tubes, circuit by circuit. A tube is
 * named by its row (1 = the row the air enters first) and its place in the row (1 = top); in a
 * case file it is written "row-tube", e.g. {@code "3-1"}.
 *
 * @param rows        rows of the coil
 * @param tubesPerRow tubes in each row
 * @param circuits    each circuit's tubes in flow order; every tube appears exactly once
 */
public record Circuiting(int rows, int tubesPerRow, List<List<Tube>> circuits) {

    private static final Pattern LABEL = Pattern.compile("\\s*(\\d+)\\s*-\\s*(\\d+)\\s*");

    /**
     * A tube's place, zero-based inside the code.
     *
     * @param row      0 = air-entering row
     * @param position 0 = top of the row
     */
    public record Tube(int row, int position) {

        /** @return the label a person reads, "row-tube", one-based */
        public String label() {
            return (row + 1) + "-" + (position + 1);
        }
    }

    /** Validates that every tube of the coil is used once and only once. */
    public Circuiting {
        circuits = circuits.stream().map(List::copyOf).toList();
        boolean[][] used = new boolean[rows][tubesPerRow];
        for (int c = 0; c < circuits.size(); c++) {
            List<Tube> circuit = circuits.get(c);
            String field = "circuiting[" + c + "]";
            if (circuit.isEmpty()) {
                throw new InputException(field, Msg.IMPOSSIBLE, "a circuit needs at least one tube");
            }
            for (Tube t : circuit) {
                if (t.row() < 0 || t.row() >= rows || t.position() < 0 || t.position() >= tubesPerRow) {
                    throw new InputException(field, Msg.IMPOSSIBLE, "tube " + t.label() + " is not in a coil of "
                            + rows + " rows of " + tubesPerRow + " tubes");
                }
                if (used[t.row()][t.position()]) {
                    throw new InputException(field, Msg.IMPOSSIBLE, "tube " + t.label() + " is used twice");
                }
                used[t.row()][t.position()] = true;
            }
        }
        for (int r = 0; r < rows; r++) {
            for (int k = 0; k < tubesPerRow; k++) {
                if (!used[r][k]) {
                    throw new InputException("circuiting", Msg.IMPOSSIBLE,
                            "tube " + new Tube(r, k).label() + " belongs to no circuit");
                }
            }
        }
    }

    /**
     * The circuiting Finstack assumes when none is given: the rows' tube places are split into
     * bands of neighbouring places, and the refrigerant in each band snakes from the row the air
     * leaves through to the row the air enters (counter-crossflow, the usual arrangement of
     * evaporators and condensers — common practice). With more circuits than tube places, each
     * band's path is cut into consecutive pieces.
     *
     * @param rows        rows
     * @param tubesPerRow tubes per row
     * @param n           circuits, 1 to rows x tubesPerRow
     * @return the circuiting
     */
    public static Circuiting standard(int rows, int tubesPerRow, int n) {
        if (n < 1 || n > rows * tubesPerRow) {
            throw new InputException("coil.circuits", Msg.OUT_OF_BOUNDS, (double) n, 1.0, (double) rows * tubesPerRow);
        }
        int bands = Math.min(n, tubesPerRow);
        List<List<Tube>> result = new ArrayList<>();
        int placed = 0;
        for (int b = 0; b < bands; b++) {
            int from = b * tubesPerRow / bands;
            int to = (b + 1) * tubesPerRow / bands;
            List<Tube> path = new ArrayList<>();
            boolean down = true;
            for (int r = rows - 1; r >= 0; r--) {
                for (int i = 0; i < to - from; i++) {
                    path.add(new Tube(r, down ? from + i : to - 1 - i));
                }
                down = !down;
            }
            int pieces = (b + 1) * n / bands - placed;
            placed += pieces;
            for (int p = 0; p < pieces; p++) {
                result.add(path.subList(p * path.size() / pieces, (p + 1) * path.size() / pieces));
            }
        }
        return new Circuiting(rows, tubesPerRow, result);
    }

    /**
     * Reads circuits written as lists of "row-tube" labels.
     *
     * @param rows        rows
     * @param tubesPerRow tubes per row
     * @param labels      each circuit's labels in flow order
     * @return the circuiting
     */
    public static Circuiting parse(int rows, int tubesPerRow, List<List<String>> labels) {
        List<List<Tube>> circuits = new ArrayList<>();
        for (int c = 0; c < labels.size(); c++) {
            List<Tube> circuit = new ArrayList<>();
            for (String s : labels.get(c)) {
                Matcher m = LABEL.matcher(s == null ? "" : s);
                if (!m.matches()) {
                    throw new InputException("circuiting[" + c + "]", Msg.IMPOSSIBLE,
                            "\"" + s + "\" is not a tube label; write row-tube, e.g. \"3-1\" for row 3 (air leaving side "
                                    + "of a 3-row coil), tube 1 (top)");
                }
                circuit.add(new Tube(Integer.parseInt(m.group(1)) - 1, Integer.parseInt(m.group(2)) - 1));
            }
            circuits.add(circuit);
        }
        return new Circuiting(rows, tubesPerRow, circuits);
    }

    /** @return number of circuits */
    public int count() {
        return circuits.size();
    }

    /** @return each circuit's labels, for files and tables */
    public List<List<String>> labels() {
        return circuits.stream().map(c -> c.stream().map(Tube::label).toList()).toList();
    }

    /** @return the circuit index of every tube, [row][position] */
    public int[][] circuitOfTube() {
        int[][] m = new int[rows][tubesPerRow];
        for (int[] row : m) {
            Arrays.fill(row, -1);
        }
        for (int c = 0; c < circuits.size(); c++) {
            for (Tube t : circuits.get(c)) {
                m[t.row()][t.position()] = c;
            }
        }
        return m;
    }
}
