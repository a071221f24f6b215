package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code finstack report}: writes a one-page PDF and an HTML page, reports a damaged option and
 * carries the capacity band unless {@code --samples 0}; without an output it says so (invariants
 * of the command; the numbers are checked against single ratings and UncertaintyBand as
 * references in PdfReportTest).
 */
class ReportCommandTest {

    @TempDir
    Path dir;

    @Test
    void writesPdfAndHtml() throws IOException {
        Path pdf = dir.resolve("report.pdf");
        Path html = dir.resolve("report.html");
        var r = RateCommandTest.run("report", "examples/projects/marrowfield-propane-cooler.finstack.json", "--out",
                pdf.toString(), "--html", html.toString());
        assertThat(r.code()).as(r.err()).isZero();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            assertThat(new PDFTextStripper().getText(doc)).contains("R290").contains("flammable");
        }
        assertThat(Files.readString(html)).contains("<table>").contains("Recommended");
    }

    @Test
    void damagedOptionIsReportedAndTheBandIsInTheTable() throws IOException {
        String text = Files.readString(Path.of("examples/projects/otterby-condenser-options.finstack.json"));
        int list = text.indexOf('[', text.indexOf("\"options\""));
        Path file = dir.resolve("damaged.finstack.json");
        Files.writeString(file, text.substring(0, list + 1) + " { \"name\": \"Broken\", \"coil\": 3 }, "
                + text.substring(list + 1));
        Path html = dir.resolve("report.html");
        var r = RateCommandTest.run("report", file.toString(), "--html", html.toString(), "--samples", "10");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(Files.readString(html)).contains("Broken").contains("not rated: options[0].coil")
                .contains("Capacity p10 - p90").contains("10 samples, seed 1");
        var off = RateCommandTest.run("report", file.toString(), "--html", html.toString(), "--samples", "0");
        assertThat(off.code()).as(off.err()).isZero();
        assertThat(Files.readString(html)).doesNotContain("Capacity p10 - p90");
    }

    /** Found in review: a folder given as the output file was an "internal error" with exit status 1. */
    @Test
    void aFolderAsTheOutputFileIsOneLineWithStatus2() {
        var r = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json", "--html",
                dir.toString(), "--samples", "0");
        assertThat(r.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err()).isEqualTo("finstack: " + dir + ": cannot write " + dir
                + ": it is a folder; give a file name" + System.lineSeparator());
        assertThat(dir).isDirectory();
    }

    @Test
    void anHtmlNameOrTheBareHtmlFlagWritesHtmlToOut() throws IOException {
        // the form "report PROJECT --out report.pdf (and --html)": --html alone, or an .html
        // name, makes --out an HTML report
        Path named = dir.resolve("summary.html");
        var a = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json", "--out",
                named.toString(), "--samples", "0");
        assertThat(a.code()).as(a.err()).isZero();
        assertThat(Files.readString(named)).startsWith("<!DOCTYPE html>").contains("<table>");
        Path flagged = dir.resolve("summary.out");
        var b = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json", "--html",
                "--out", flagged.toString(), "--samples", "0");
        assertThat(b.code()).as(b.err()).isZero();
        assertThat(Files.readString(flagged)).startsWith("<!DOCTYPE html>");
        var c = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json", "--html");
        assertThat(c.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(c.err()).contains("--out");
    }

    @Test
    void withoutAnOutputFileEndsWithStatus2() {
        var r = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("--out");
    }
}
