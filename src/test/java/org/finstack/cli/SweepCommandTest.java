package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.finstack.coil.CoilModels;
import org.finstack.io.CaseFiles;
import org.finstack.study.Sweep;
import org.finstack.testing.Reference;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * {@code finstack sweep}: the CSV parses back by RFC 4180 rules with units in its header, its
 * values equal single ratings, and an impossible value gives a row with its reason (quoted).
 */
class SweepCommandTest {

    static final String CASE = "examples/otterby-rooftop-condenser-full.json";

    @Test
    void csvParsesBackAndEqualsSingleRatings() {
        var r = RateCommandTest.run("sweep", CASE, "--vary", "rows=1:5:1", "--csv");
        assertThat(r.code()).as(r.err()).isZero();
        List<List<String>> rows = parse(r.out());
        assertThat(rows.get(0)).startsWith("rows [-]", "capacity [W]", "airPressureDrop [Pa]");
        assertThat(rows).hasSize(6);
        var base = CaseFiles.read(Path.of(CASE));
        double last = 0;
        for (int i = 1; i < rows.size(); i++) {
            assertThat(rows.get(i)).hasSize(rows.get(0).size());
            double rowsValue = Double.parseDouble(rows.get(i).get(0));
            double q = Double.parseDouble(rows.get(i).get(1));
            double alone = CoilModels.rate(Sweep.Parameter.ROWS.apply(base, rowsValue)).capacity();
            Reference.assertRelative(alone, q, 1e-6, "rows " + rowsValue);
            assertThat(q).isGreaterThan(last);
            last = q;
        }
        assertThat(r.out()).contains("\r\n").doesNotContain("NaN");
    }

    @Test
    void unitOptionAndImpossibleValues() {
        var r = RateCommandTest.run("sweep", CASE, "--vary", "finThickness=0.1:2.5:0.8", "--unit", "mm");
        assertThat(r.code()).as(r.err()).isZero();
        List<List<String>> rows = parse(r.out());
        assertThat(rows).hasSize(5);
        assertThat(rows.get(1).get(1)).isNotEmpty();
        String error = rows.get(4).get(rows.get(0).size() - 1);
        assertThat(error).contains("finPitch");
    }

    @Test
    void jsonAndBadRanges() {
        var r = RateCommandTest.run("sweep", CASE, "--vary", "saturationTemperature=40:50:5", "--unit", "C", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("\"points\"").contains("capacity_W");
        assertThat(RateCommandTest.run("sweep", CASE, "--vary", "colour=1:2:1").code()).isEqualTo(2);
        assertThat(RateCommandTest.run("sweep", CASE, "--vary", "rows=5:1:1").code()).isEqualTo(2);
        assertThat(RateCommandTest.run("sweep", CASE, "--vary", "rows=1:1000000:1").code()).isEqualTo(2);
    }

    /** RFC 4180 reader: comma separated, CRLF records, double-quoted fields with doubled quotes. */
    static List<List<String>> parse(String text) {
        List<List<String>> out = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder f = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    f.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    f.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                row.add(f.toString());
                f.setLength(0);
            } else if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                row.add(f.toString());
                f.setLength(0);
                out.add(row);
                row = new ArrayList<>();
                i++;
            } else {
                f.append(c);
            }
        }
        return out;
    }
}
