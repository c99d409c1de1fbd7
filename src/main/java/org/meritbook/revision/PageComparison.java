package org.meritbook.revision;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.pdfbox.cos.COSBase;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation;
import org.apache.pdfbox.text.PDFTextStripper;

/**
 * Compares what two dossiers show: each page's text as PDFBox extracts it, then (when every text
 * agrees) each page's drawing instructions and annotations. A signature field's widget is not
 * content: signing in a PDF reader adds one.
 */
final class PageComparison {
    private static final int SHOWN = 90;

    private PageComparison() {
    }

    static List<String> texts(PDDocument doc) {
        try {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setLineSeparator("\n");
            List<String> pages = new ArrayList<>();
            for (int i = 1; i <= doc.getNumberOfPages(); i++) {
                stripper.setStartPage(i);
                stripper.setEndPage(i);
                pages.add(stripper.getText(doc));
            }
            return pages;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot extract the pages' text", e);
        }
    }

    /**
     * @param given    the pages of the dossier as received
     * @param expected the pages of the dossier its attachments render to
     * @return the first difference in words (page, what it shows, what the attachments give), or none
     */
    static List<String> textDifferences(List<String> given, List<String> expected) {
        List<String> out = new ArrayList<>();
        int differing = 0;
        String first = null;
        for (int i = 0; i < Math.min(given.size(), expected.size()); i++) {
            if (!given.get(i).equals(expected.get(i))) {
                differing++;
                if (first == null) {
                    first = "page " + (i + 1) + " shows " + firstDifferingLine(given.get(i), expected.get(i));
                }
            }
        }
        if (first != null) {
            out.add(first + (differing > 1 ? " (" + (differing - 1) + " more page" + (differing == 2 ? "" : "s")
                    + " differ)" : ""));
        }
        if (given.size() != expected.size()) {
            out.add("the dossier has " + given.size() + " pages where its attachments give " + expected.size());
        }
        return out;
    }

    private static String firstDifferingLine(String given, String expected) {
        String[] a = given.split("\n", -1);
        String[] b = expected.split("\n", -1);
        int line = 0;
        while (line < a.length && line < b.length && a[line].equals(b[line])) {
            line++;
        }
        String shown = line < a.length ? a[line] : "";
        String wanted = line < b.length ? b[line] : "";
        int at = 0;
        while (at < shown.length() && at < wanted.length() && shown.charAt(at) == wanted.charAt(at)) {
            at++;
        }
        int from = Math.max(0, at - SHOWN / 2);
        return quote(shown, from) + " where its attachments give " + quote(wanted, from);
    }

    private static String quote(String line, int from) {
        String s = line.substring(Math.min(from, line.length()));
        String cut = s.length() > SHOWN ? s.substring(0, SHOWN) + "…" : s;
        return "\"" + (from > 0 ? "…" : "") + cut.strip() + "\"";
    }

    /** Pages whose drawing instructions or annotations differ, for when every page's text agrees. */
    static List<String> drawingDifferences(PDDocument given, PDDocument expected) {
        List<String> out = new ArrayList<>();
        int pages = Math.min(given.getNumberOfPages(), expected.getNumberOfPages());
        for (int i = 0; i < pages; i++) {
            PDPage g = given.getPage(i);
            PDPage e = expected.getPage(i);
            if (!Arrays.equals(contents(g), contents(e))) {
                out.add("page " + (i + 1) + " is drawn differently from the dossier its attachments give "
                        + "(the same text; a figure, line or colour differs)");
            }
            Map<String, Integer> ga = annotations(g);
            Map<String, Integer> ea = annotations(e);
            if (!ga.equals(ea)) {
                out.add("page " + (i + 1) + " carries the annotations " + ga + " where the dossier its attachments "
                        + "give carries " + ea);
            }
        }
        return out;
    }

    private static byte[] contents(PDPage page) {
        try (InputStream in = page.getContents()) {
            return in == null ? new byte[0] : in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read a page's content", e);
        }
    }

    /** Annotation subtype → count, without signature widgets. */
    private static Map<String, Integer> annotations(PDPage page) {
        Map<String, Integer> out = new TreeMap<>();
        try {
            for (PDAnnotation a : page.getAnnotations()) {
                if (!isSignatureWidget(a.getCOSObject())) {
                    out.merge(String.valueOf(a.getSubtype()), 1, Integer::sum);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read a page's annotations", e);
        }
        return out;
    }

    private static boolean isSignatureWidget(COSDictionary annotation) {
        if (!COSName.WIDGET.equals(annotation.getCOSName(COSName.SUBTYPE))) {
            return false;
        }
        COSDictionary field = annotation;
        for (int depth = 0; field != null && depth < 8; depth++) {
            if (COSName.SIG.equals(field.getCOSName(COSName.FT))) {
                return true;
            }
            COSBase parent = field.getDictionaryObject(COSName.PARENT);
            field = parent instanceof COSDictionary d ? d : null;
        }
        return false;
    }
}
