package org.finstack.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Cautions;
import org.finstack.study.Project;
import org.finstack.study.Progress;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.DesignBasis;
import org.finstack.study.uncertainty.UncertaintyBand;
import org.finstack.study.compare.OptionResult;
import org.finstack.testing.Reference;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import org.junit.jupiter.api.Test;

/**
 * The one-page PDF says what the comparison says: its text, read back with PDFBox, holds each
 * option's capacity, air pressure drop and metal mass, and these equal single ratings of the same
 * coils (CoilModels.rate, the independent reference) to the printed digits. Page 1 is rendered to
 * target/report-page1.png for a person to look at. With capacity bands, the table carries each
 * option's p10 - p90 (equal to UncertaintyBand's for the same case, count and seed) on the one page.
 */
class PdfReportTest {

    static final Path FULL = Path.of("examples/projects/otterby-condenser-options-full.finstack.json");

    @Test
    void pdfTextHoldsTheComparisonsNumbers() throws IOException {
        Project p = ProjectFiles.read(FULL);
        Comparison c = Comparison.of(p);
        Summary s = Summary.of(c, UnitSystem.SI);
        Path out = Path.of("target/report-test.pdf");
        PdfReport.write(s, out);
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ');
            assertThat(text).contains(c.project().name()).contains("Recommended:").contains("Methods")
                    .contains("Cautions").contains(Cautions.GOVERNING.substring(0, 40));
            for (OptionResult o : c.options()) {
                Rating alone = CoilModels.rate(p.caseOf(o.index()));
                String cap = Quantities.format(o.rating().capacity(), Dimension.HEAT_FLOW, UnitSystem.SI);
                assertThat(text).as(o.name()).contains(cap);
                Reference.assertRelative(alone.capacity() / 1000, number(cap), 5e-4, o.name() + " capacity");
                String mass = Quantities.format(alone.geometry().metalMass(), Dimension.MASS, UnitSystem.SI);
                assertThat(text).as(o.name()).contains(mass);
                String dp = Quantities.format(o.deliveredAirPressureDrop(), Dimension.PRESSURE_DIFFERENCE,
                        UnitSystem.SI);
                assertThat(text).as(o.name()).contains(dp);
                String charge = Quantities.format(alone.refrigerant().charge(), Dimension.MASS, UnitSystem.SI);
                assertThat(text).as(o.name()).contains(charge);
            }
            for (var m : c.options().get(0).rating().methods()) {
                assertThat(text.replaceAll("\\s+", " ")).contains(m.key());
            }
            BufferedImage page = new PDFRenderer(doc).renderImageWithDPI(0, 110);
            ImageIO.write(page, "png", Path.of("target/report-page1.png").toFile());
            assertThat(page.getWidth()).isGreaterThan(800);
        }
    }

    @Test
    void writingKeepsThePreviousFileAsBackup() throws IOException {
        Path out = Path.of("target/report-backup-test.pdf");
        Files.deleteIfExists(out);
        Summary s = Summary.of(Comparison.of(ProjectFiles.read(FULL)), UnitSystem.US);
        PdfReport.write(s, out);
        PdfReport.write(s, out);
        assertThat(out.resolveSibling(out.getFileName() + ".bak")).exists();
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            assertThat(new PDFTextStripper().getText(doc)).contains("Btu/h");
        }
    }

    @Test
    void htmlHoldsTheSameTable() {
        Summary s = Summary.of(Comparison.of(ProjectFiles.read(FULL)), UnitSystem.SI);
        String html = HtmlReport.html(s);
        for (var row : s.rows()) {
            for (String cell : row) {
                assertThat(html).contains(cell.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")
                        .replace("\"", "&quot;"));
            }
        }
        assertThat(html).contains("data:image/png;base64,").contains(Cautions.GOVERNING.substring(0, 40));
    }

    @Test
    void bandIsInTheTableWhenItFitsOnTheOnePage() throws IOException {
        // reference: each option's UncertaintyBand (study.uncertainty), default count and seed
        Project p = ProjectFiles.read(FULL);
        Comparison c = Comparison.of(p, DesignBasis.defaultFor(p.conditions()), BandSettings.DEFAULT, Progress.NONE);
        Summary s = Summary.of(c, UnitSystem.SI);
        assertThat(s.hasBand()).isTrue();
        assertThat(s.header()).contains("Capacity p10 - p90");
        assertThat(s.rows()).allMatch(r -> r.size() == s.header().size());
        assertThat(s.withoutBand().header()).doesNotContain("Capacity p10 - p90");
        assertThat(s.withoutBand().rows()).allMatch(r -> r.size() == s.header().size() - 1);
        try (PDDocument doc = Loader.loadPDF(PdfReport.bytes(s))) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ').replaceAll("\\s+", " ");
            assertThat(text).contains("Capacity p10 - p90").contains("Capacity band:");
            for (OptionResult o : c.options()) {
                var band = UncertaintyBand.of(p.caseOf(o.index()), BandSettings.DEFAULT_SAMPLES,
                        BandSettings.DEFAULT_SEED);
                assertThat(text).as(o.name()).contains(Quantities.format(band.capacityP10(), Dimension.HEAT_FLOW,
                        UnitSystem.SI));
            }
            ImageIO.write(new PDFRenderer(doc).renderImageWithDPI(0, 110), "png",
                    Path.of("target/report-band-page1.png").toFile());
        }
        assertThat(HtmlReport.html(s)).contains("Capacity p10 - p90");
    }

    private static double number(String formatted) {
        Matcher m = Pattern.compile("^-?[0-9.]+").matcher(formatted);
        assertThat(m.find()).isTrue();
        return Double.parseDouble(m.group());
    }
}
