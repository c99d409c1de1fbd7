package org.meritbook.dossier;

import java.util.Arrays;

/** A rendered dossier: the HTML page and the PDF/A-3 document, as bytes. */
public record RenderedDossier(byte[] html, byte[] pdf) {
    public RenderedDossier {
        html = html.clone();
        pdf = pdf.clone();
    }

    @Override
    public byte[] html() {
        return html.clone();
    }

    @Override
    public byte[] pdf() {
        return pdf.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RenderedDossier d && Arrays.equals(html, d.html) && Arrays.equals(pdf, d.pdf);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(html) + Arrays.hashCode(pdf);
    }

    @Override
    public String toString() {
        return "RenderedDossier[html=" + html.length + " bytes, pdf=" + pdf.length + " bytes]";
    }
}
