package org.finstack.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.finstack.io.AtomicFiles;

/**
 * Lays a {@link Summary} out on one A4 page with PDFBox. Text is set in Helvetica; sections that
 * would run off the page are set smaller, step by step, until the whole summary fits on the one
 * page (down to {@link #MIN_SCALE}); below that the methods' references are cut to one line each.
 * When the table carries the capacity band and the page still overflows, the band's column is left
 * out (the HTML page keeps it).
 */
public final class PdfReport {

    /** Smallest text scale tried before references are shortened. */
    public static final double MIN_SCALE = 0.6;

    private static final float MARGIN = 36;
    private static final float BODY = 8.5f;

    private PdfReport() {
    }

    /**
     * Writes the summary as a one-page PDF, atomically (the previous file kept as {@code NAME.bak}).
     *
     * @param s    the summary
     * @param file where to write
     * @throws UncheckedIOException when the file cannot be written (the old file is then unchanged)
     */
    public static void write(Summary s, Path file) {
        try {
            AtomicFiles.write(file, bytes(s));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * @param s the summary
     * @return the one-page PDF
     */
    public static byte[] bytes(Summary s) {
        if (s.hasBand()) {
            byte[] pdf = fitted(s);
            return pdf != null ? pdf : fittedOrFail(s.withoutBand());
        }
        return fittedOrFail(s);
    }

    private static byte[] fittedOrFail(Summary s) {
        byte[] pdf = fitted(s);
        if (pdf == null) {
            throw new IllegalStateException("the summary does not fit on one page even at the smallest text");
        }
        return pdf;
    }

    /** @return the one-page PDF, or null when the summary does not fit even with shortened references */
    private static byte[] fitted(Summary s) {
        byte[] chart = CapacityChart.png(s.chart(), 1400, 520);
        for (double scale = 1.0; scale >= MIN_SCALE - 1e-9; scale -= 0.05) {
            byte[] pdf = render(s, chart, scale, false);
            if (pdf != null) {
                return pdf;
            }
        }
        return render(s, chart, MIN_SCALE, true);
    }

    /** @return the PDF, or null when the content ran off the page */
    private static byte[] render(Summary s, byte[] chartPng, double scale, boolean shortReferences) {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(Text.clean(s.title()));
            info.setCreator("Finstack");
            PDImageXObject image = PDImageXObject.createFromByteArray(doc, chartPng, "chart.png");
            boolean fits;
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                Text t = new Text(cs, page.getMediaBox(), (float) scale);
                t.heading(s.title(), 15);
                t.paragraph("Question: " + s.question(), BODY, false);
                t.paragraph(s.recommendation(), BODY + 1, true);
                t.gap(3);
                t.table(s.header(), s.rows(), 7f);
                t.gap(4);
                float w = page.getMediaBox().getWidth() - 2 * MARGIN;
                float h = w * 520f / 1400f * (float) Math.max(0.75, scale);
                t.image(image, w * (float) Math.max(0.75, scale), h);
                t.section("Trade-offs");
                for (String x : s.tradeOffs()) {
                    t.bullet(x, BODY);
                }
                t.section("Assumptions and conditions");
                for (String x : s.assumptions()) {
                    t.bullet(x, BODY - 1);
                }
                t.section("Methods");
                for (String m : s.methods()) {
                    t.bullet(shortReferences ? t.oneLine(m, BODY - 2) : m, BODY - 2);
                }
                t.section("Cautions");
                for (String x : s.cautions()) {
                    t.bullet(x, BODY - 1);
                }
                t.gap(2);
                t.paragraph(s.disclaimer(), BODY - 1, true);
                fits = !t.overflowed();
            }
            if (!fits) {
                return null;
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot lay out the summary", e);
        }
    }

    private static Logger quiet(String name) {
        Logger log = Logger.getLogger(name);
        log.setLevel(Level.SEVERE);
        return log;
    }

    /** A cursor that sets wrapped text down the page and notes when it runs past the bottom. */
    private static final class Text {
        /**
         * Held so the setting lasts: the standard fonts are not embedded (every viewer has them),
         * and PDFBox logs a warning each time it maps one to a system font on this machine, which
         * is noise for a person running {@code report}.
         */
        private static final Logger FONT_LOG = quiet("org.apache.pdfbox.pdmodel.font.PDType1Font");
        private static final PDType1Font REGULAR = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
        private static final PDType1Font BOLD = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
        private static final Map<Character, Boolean> ENCODABLE = new HashMap<>();

        /** Relative widths of the table's columns by their heads (1 when not listed). */
        private static final Map<String, Float> WEIGHTS = Map.of("#", 0.4f, "Option", 2.6f, "Capacity", 1.2f,
                Summary.BAND, 1.7f, "vs existing", 0.9f, "Air dp", 0.9f, "Airflow (fan)", 1.1f, "Capacity on fan",
                1.1f, "Pressure margin", 1.3f);

        private final PDPageContentStream cs;
        private final float left;
        private final float width;
        private final float bottom;
        private final float scale;
        private float y;
        private boolean overflow;

        Text(PDPageContentStream cs, PDRectangle box, float scale) {
            this.cs = cs;
            this.left = MARGIN;
            this.width = box.getWidth() - 2 * MARGIN;
            this.bottom = MARGIN;
            this.scale = scale;
            this.y = box.getHeight() - MARGIN;
        }

        boolean overflowed() {
            return overflow;
        }

        void gap(float pt) {
            y -= pt * scale;
        }

        void heading(String s, float size) throws IOException {
            line(clean(s), left, BOLD, size, true);
            gap(2);
        }

        void section(String s) throws IOException {
            gap(4);
            line(clean(s), left, BOLD, BODY + 1.5f, true);
        }

        void paragraph(String s, float size, boolean bold) throws IOException {
            for (String l : wrap(clean(s), bold ? BOLD : REGULAR, size * scale, width)) {
                line(l, left, bold ? BOLD : REGULAR, size, true);
            }
        }

        void bullet(String s, float size) throws IOException {
            List<String> lines = wrap(clean(s), REGULAR, size * scale, width - 9);
            for (int i = 0; i < lines.size(); i++) {
                if (i == 0) {
                    write("-", left, y - size * scale, REGULAR, size * scale);
                }
                line(lines.get(i), left + 9, REGULAR, size, true);
            }
        }

        String oneLine(String s, float size) throws IOException {
            String c = clean(s);
            List<String> l = wrap(c, REGULAR, size * scale, width - 9);
            return l.size() <= 1 ? c : l.get(0).replaceAll("\\S+$", "") + "...";
        }

        void image(PDImageXObject img, float w, float h) throws IOException {
            y -= h;
            if (y < bottom) {
                overflow = true;
                return;
            }
            cs.drawImage(img, left + (width - w) / 2, y, w, h);
        }

        void table(List<String> header, List<List<String>> rows, float size) throws IOException {
            float fs = size * scale;
            float[] widths = new float[header.size()];
            float total = 0;
            for (int i = 0; i < widths.length; i++) {
                widths[i] = WEIGHTS.getOrDefault(header.get(i), 1.0f);
                total += widths[i];
            }
            for (int i = 0; i < widths.length; i++) {
                widths[i] = width * widths[i] / total;
            }
            row(header, widths, BOLD, fs);
            rule(0.8f);
            for (List<String> r : rows) {
                if (r.size() > 2 && r.get(2).startsWith("not rated")) {
                    List<String> merged = new ArrayList<>(r.subList(0, 2));
                    merged.add(r.get(2));
                    float[] w = {widths[0], widths[1], width - widths[0] - widths[1]};
                    row(merged, w, REGULAR, fs);
                } else {
                    row(r, widths, REGULAR, fs);
                }
                rule(0.3f);
            }
        }

        private void row(List<String> cells, float[] widths, PDType1Font font, float fs) throws IOException {
            List<List<String>> wrapped = new ArrayList<>();
            int lines = 1;
            for (int i = 0; i < cells.size(); i++) {
                List<String> w = wrap(clean(cells.get(i)), font, fs, widths[i] - 3);
                wrapped.add(w);
                lines = Math.max(lines, w.size());
            }
            float lead = fs * 1.25f;
            if (y - lines * lead < bottom) {
                overflow = true;
                y -= lines * lead;
                return;
            }
            float x = left;
            for (int i = 0; i < cells.size(); i++) {
                List<String> w = wrapped.get(i);
                for (int k = 0; k < w.size(); k++) {
                    write(w.get(k), x, y - fs - k * lead, font, fs);
                }
                x += widths[i];
            }
            y -= lines * lead + 1;
        }

        private void rule(float thickness) throws IOException {
            cs.setLineWidth(thickness);
            cs.moveTo(left, y);
            cs.lineTo(left + width, y);
            cs.stroke();
            y -= 1.5f;
        }

        private void line(String s, float x, PDType1Font font, float size, boolean advance) throws IOException {
            float fs = size * scale;
            if (y - fs * 1.25f < bottom) {
                overflow = true;
                y -= fs * 1.25f;
                return;
            }
            write(s, x, y - fs, font, fs);
            if (advance) {
                y -= fs * 1.25f;
            }
        }

        private void write(String s, float x, float baseline, PDType1Font font, float fs) throws IOException {
            if (overflow) {
                return;
            }
            cs.beginText();
            cs.setFont(font, fs);
            cs.newLineAtOffset(x, baseline);
            cs.showText(s);
            cs.endText();
        }

        private static List<String> wrap(String s, PDType1Font font, float fs, float max) throws IOException {
            List<String> out = new ArrayList<>();
            StringBuilder line = new StringBuilder();
            for (String word : s.split(" ")) {
                String trial = line.length() == 0 ? word : line + " " + word;
                if (font.getStringWidth(trial) / 1000 * fs <= max || line.length() == 0) {
                    line.setLength(0);
                    line.append(trial);
                } else {
                    out.add(line.toString());
                    line.setLength(0);
                    line.append(word);
                }
            }
            out.add(line.toString());
            return out;
        }

        /** Replaces characters Helvetica's WinAnsi encoding cannot show. */
        static String clean(String s) {
            StringBuilder b = new StringBuilder();
            for (char ch : s.toCharArray()) {
                switch (ch) {
                    case '\u2013', '\u2014', '\u2212' -> b.append('-');
                    case '\u2018', '\u2019' -> b.append('\'');
                    case '\u201c', '\u201d' -> b.append('"');
                    case '\u2264' -> b.append("<=");
                    case '\u2265' -> b.append(">=");
                    case '\n', '\r', '\t' -> b.append(' ');
                    default -> b.append(encodable(ch) ? ch : '?');
                }
            }
            return b.toString();
        }

        private static synchronized boolean encodable(char ch) {
            return ENCODABLE.computeIfAbsent(ch, c -> {
                try {
                    REGULAR.encode(String.valueOf(c));
                    return true;
                } catch (IOException | IllegalArgumentException e) {
                    return false;
                }
            });
        }
    }
}
