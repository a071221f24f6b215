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

/** {@code finstack report}: writes a one-page PDF and an HTML page; without an output it says so (invariants of the command; the numbers are checked against single ratings as reference in PdfReportTest). */
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
    void withoutAnOutputFileEndsWithStatus2() {
        var r = RateCommandTest.run("report", "examples/projects/otterby-condenser-options.finstack.json");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("--out");
    }
}
