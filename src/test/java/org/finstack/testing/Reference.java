package org.finstack.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Test helpers for checks against outside references: a relative comparison that prints its
 * context on failure, and a reader for the committed reference-data files (CSV with a {@code #}
 * header naming source, table, units, tolerance and generating script).
 */
public final class Reference {

    private Reference() {
    }

    /**
     * Asserts |actual - expected| <= tol * |expected| (or <= tol when expected is zero).
     *
     * @param expected reference value
     * @param actual   computed value
     * @param tol      relative tolerance
     * @param context  what was compared, with its inputs and the reference's source
     */
    public static void assertRelative(double expected, double actual, double tol, String context) {
        double scale = expected == 0 ? 1 : Math.abs(expected);
        double err = Math.abs(actual - expected) / scale;
        if (!(err <= tol)) {
            fail(String.format(Locale.ROOT, "%s: expected %.9g, got %.9g (relative error %.3g > %.3g)",
                    context, expected, actual, err, tol));
        }
    }

    /**
     * Reads a committed reference CSV from the test class path; lines starting with {@code #}
     * are the header and are skipped, as is the first non-comment line (column names).
     *
     * @param resource class-path resource, e.g. {@code /reference/bessel.csv}
     * @return rows of numbers
     */
    public static List<double[]> csv(String resource) {
        try (InputStream in = Reference.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing reference file " + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<double[]> rows = new ArrayList<>();
            boolean header = true;
            for (String line; (line = r.readLine()) != null; ) {
                String t = line.strip();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                String[] parts = t.split(",");
                double[] row = new double[parts.length];
                for (int i = 0; i < parts.length; i++) {
                    row[i] = Double.parseDouble(parts[i].strip());
                }
                rows.add(row);
            }
            return rows;
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
