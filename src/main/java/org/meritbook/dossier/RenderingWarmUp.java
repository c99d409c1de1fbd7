package org.meritbook.dossier;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;

/**
 * A throw-away two-page dossier rendered while a command is still reading its workbook and
 * computing: it loads and compiles the rendering stack (page layout with running heads and tables,
 * outlined chart text, SVG to PDF, PDF/A metadata and an attachment) on the second core, so the
 * real dossier starts on warm code. Its bytes go nowhere; a renderer that has warmed up renders the
 * same bytes as one that has not (DossierRendererTest).
 */
final class RenderingWarmUp {
    private static final int TABLE_ROWS = 40;

    private RenderingWarmUp() {
    }

    static void run(PdfRenderer pdf, PdfAFinisher finisher, SvgChartRenderer charts) {
        FigureArt art = new FigureArt(charts::render);
        Markup figure = art.placeholder(figure());
        art.startDrawing();
        Calendar date = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        date.clear();
        date.set(2000, Calendar.JANUARY, 1);
        PdfAFinisher.Metadata meta = new PdfAFinisher.Metadata("warm-up", "meritbook", "warm-up", "meritbook", date,
                new byte[16]);
        Attachment note = new Attachment("warm-up.txt", "text/plain", "Data", "warm-up", "results", null);
        finisher.finish(pdf.render(xhtml(figure), art), meta,
                List.of(new PdfAFinisher.Embedded(note, "warm-up".getBytes(StandardCharsets.UTF_8))));
    }

    private static FigureSpec figure() {
        double[] x = {0.5, 1, 2, 5, 10, 20, 50, 100};
        double[] y = new double[x.length];
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            y[i] = 12.5 * x[i] + 0.8 + (i % 3 - 1) * 0.4;
            notes.add("point " + (i + 1));
        }
        return new FigureSpec("warm-up", "Warm-up", "Nominal (mg/L)", "Response (a.u.)", List.of(
                new FigureSpec.Series("Standards", FigureSpec.Style.POINTS, x, y, notes),
                new FigureSpec.Series("Fit", FigureSpec.Style.LINE, new double[] {0, 100}, new double[] {0.8, 1250.8},
                        List.of())));
    }

    private static String xhtml(Markup figure) {
        StringBuilder rows = new StringBuilder();
        for (int i = 1; i <= TABLE_ROWS; i++) {
            rows.append("<tr><td class=\"c-num\">").append(i).append("</td><td class=\"addr\">Sheet!B").append(i + 8)
                    .append("</td><td class=\"c-num\">").append(String.format(Locale.ROOT, "%.4f", i * 1.2345))
                    .append("</td><td><b>pass</b> <i>within</i> <code>1/x²</code> ±0.5 µg·kg⁻¹ — r²</td></tr>\n");
        }
        return "<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\"><head><meta charset=\"UTF-8\"/>"
                + "<title>warm-up</title><style>\n" + css() + "\n</style>"
                + "<bookmarks><bookmark name=\"1 Section\" href=\"#s1\"/></bookmarks></head>"
                + "<body class=\"print\">"
                + "<div class=\"running running-head\"><table><tr><td>Warm-up · Revision 1</td>"
                + "<td class=\"run-right\">meritbook</td></tr></table></div>"
                + "<div class=\"running running-foot\"><table><tr><td>ID</td><td class=\"run-right\">Page "
                + "<span class=\"pageno\"></span> of <span class=\"pagecount\"></span></td></tr></table></div>"
                + "<div class=\"chapter\" id=\"s1\"><h1><span class=\"num\">1</span> Section</h1>"
                + "<p class=\"lead\">A paragraph of running text that wraps over more than one line of the page, "
                + "with <a href=\"#s1\">a link</a> and <span class=\"mono\">monospaced</span> words.</p>"
                + "<table class=\"data\"><thead><tr><th>#</th><th>Cell</th><th>Value</th><th>Note</th></tr></thead>"
                + "<tbody>" + rows + "</tbody></table>"
                + "<div class=\"figure-art\">" + figure.html() + "</div></div></body></html>";
    }

    private static String css() {
        String path = TemplateEngine.CLASSPATH_PREFIX + "/dossier.css";
        try (InputStream in = RenderingWarmUp.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException(path + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(path + " could not be read", e);
        }
    }
}
