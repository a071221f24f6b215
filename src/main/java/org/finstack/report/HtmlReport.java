package org.finstack.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import org.finstack.io.AtomicFiles;

/**
 * Writes a {@link Summary} as one self-contained HTML page (the chart embedded as a PNG), sized
 * to print on one A4 page.
 */
public final class HtmlReport {

    private HtmlReport() {
    }

    /**
     * Writes the page atomically (the previous file kept as {@code NAME.bak}).
     *
     * @param s    the summary
     * @param file where to write
     * @throws UncheckedIOException when the file cannot be written (the old file is then unchanged)
     */
    public static void write(Summary s, Path file) {
        try {
            AtomicFiles.write(file, html(s).getBytes(StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * @param s the summary
     * @return the page
     */
    public static String html(Summary s) {
        StringBuilder b = new StringBuilder();
        b.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>").append(esc(s.title()))
                .append("</title>\n<style>\n@page { size: A4; margin: 12mm; }\n"
                        + "body { font-family: Helvetica, Arial, sans-serif; font-size: 9pt; max-width: 186mm; margin: auto; }\n"
                        + "h1 { font-size: 14pt; margin: 0 0 4pt; } h2 { font-size: 10pt; margin: 8pt 0 2pt; }\n"
                        + "table { border-collapse: collapse; width: 100%; font-size: 7.5pt; }\n"
                        + "th, td { border-bottom: 1px solid #bbb; padding: 2pt 3pt; text-align: left; vertical-align: top; }\n"
                        + ".rec { font-weight: bold; } ul { margin: 0; padding-left: 14pt; } .small { font-size: 7.5pt; }\n"
                        + "img { width: 100%; }\n</style></head><body>\n");
        b.append("<h1>").append(esc(s.title())).append("</h1>\n<p>Question: ").append(esc(s.question()))
                .append("</p>\n<p class=\"rec\">").append(esc(s.recommendation())).append("</p>\n<table><thead><tr>");
        s.header().forEach(h -> b.append("<th>").append(esc(h)).append("</th>"));
        b.append("</tr></thead><tbody>\n");
        for (List<String> r : s.rows()) {
            b.append("<tr>");
            r.forEach(c -> b.append("<td>").append(esc(c)).append("</td>"));
            b.append("</tr>\n");
        }
        b.append("</tbody></table>\n<p><img alt=\"Capacity and air pressure drop per option\" src=\"data:image/png;base64,")
                .append(Base64.getEncoder().encodeToString(CapacityChart.png(s.chart(), 1400, 520))).append("\"></p>\n");
        list(b, "Trade-offs", s.tradeOffs(), "");
        list(b, "Assumptions and conditions", s.assumptions(), "small");
        list(b, "Methods", s.methods(), "small");
        list(b, "Cautions", s.cautions(), "small");
        b.append("<p class=\"rec small\">").append(esc(s.disclaimer())).append("</p>\n</body></html>\n");
        return b.toString();
    }

    private static void list(StringBuilder b, String title, List<String> items, String cls) {
        b.append("<h2>").append(esc(title)).append("</h2>\n<ul").append(cls.isEmpty() ? "" : " class=\"" + cls + "\"")
                .append(">\n");
        items.forEach(i -> b.append("<li>").append(esc(i)).append("</li>\n"));
        b.append("</ul>\n");
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
