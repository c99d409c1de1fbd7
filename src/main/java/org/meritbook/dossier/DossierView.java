package org.meritbook.dossier;

import java.util.List;

/**
 * The typed view-model of a whole dossier: every value already formatted, nothing null (Freemarker
 * fails on a missing value), lists in document order. Templates only lay this out.
 *
 * @param pdf        true for the PDF layout (bookmarks, running header), false for the HTML page
 * @param cover      the cover page
 * @param revisions  revision history, oldest first
 * @param contents   the table of contents (also the PDF outline)
 * @param summary    the summary of characteristics
 * @param intro      narrative before the first analysis, or empty
 * @param sections   one per analysis cell, in notebook order
 * @param closing    narrative after the last analysis, or null-free empty
 * @param trail      the calculation trail, one group per section
 * @param inputs     the input manifest
 * @param software   software and environment rows
 * @param notes      fixed explanatory notes (caution, display rules, replacement of missing glyphs)
 */
public record DossierView(boolean pdf, Cover cover, List<RevisionRow> revisions, List<TocEntry> contents,
                          Summary summary, Chapter intro, List<SectionView> sections, Chapter closing,
                          List<TrailGroup> trail, List<InputRow> inputs, List<SoftwareRow> software, Notes notes) {
    public DossierView {
        revisions = List.copyOf(revisions);
        contents = List.copyOf(contents);
        sections = List.copyOf(sections);
        trail = List.copyOf(trail);
        inputs = List.copyOf(inputs);
        software = List.copyOf(software);
    }

    DossierView forPdf(boolean asPdf) {
        return new DossierView(asPdf, cover, revisions, contents, summary, intro, sections, closing, trail, inputs,
                software, notes);
    }

    /** Cover page and running header fields. */
    public record Cover(String title, String method, String laboratory, String revision, String date,
                        String preparedBy, String status, String outcome, String criteria, String documentId) {
        /** The first 16 hex digits of the document ID, for the running footer. */
        public String shortId() {
            return documentId.length() > 16 ? documentId.substring(0, 16) : documentId;
        }
    }

    public record RevisionRow(String revision, String date, String reason, String preparedBy) {
    }

    /** One entry of the contents and of the PDF outline. */
    public record TocEntry(String number, String title, String anchor, List<TocEntry> children) {
        public TocEntry {
            children = List.copyOf(children);
        }
    }

    public record Summary(String number, List<SummaryRow> rows, String counts) {
        public Summary {
            rows = List.copyOf(rows);
        }
    }

    /**
     * @param section        section title
     * @param sectionAnchor  link target of the section
     * @param characteristic what is judged or reported
     * @param result         value with unit (and ± half-width when symmetric)
     * @param resultNote     the interval line, or empty
     * @param criterion      the rule, or "no criterion set"
     * @param verdict        the outcome
     */
    public record SummaryRow(String section, String sectionAnchor, String characteristic, String result,
                             String resultNote, String criterion, VerdictView verdict) {
    }

    /** An outcome as shown: word, symbol (so colour is never the only signal), css class, reason. */
    public record VerdictView(String word, String symbol, String css, String reason) {
    }

    /** A narrative-only chapter (introduction or closing notes); {@code present} false when there is none. */
    public record Chapter(boolean present, String number, String title, String anchor, Markup narrative) {
    }

    /** Fixed texts shown in the dossier. */
    public record Notes(String caution, String criteria, String glyphs, String rounding) {
    }

    public record InputRow(String alias, String path, String size, String sha256, List<String> ranges,
                           String attachment) {
        public InputRow {
            ranges = List.copyOf(ranges);
        }
    }

    public record SoftwareRow(String name, String version) {
    }

    public record TrailGroup(String number, String title, String anchor, List<StepView> steps) {
        public TrailGroup {
            steps = List.copyOf(steps);
        }
    }

    /**
     * @param number  e.g. "A.1.3"
     * @param anchor  link target
     * @param id      the trail step id
     * @param label   plain-language label
     * @param formula formula in plain notation
     * @param method  published method or reference, or empty
     * @param value   result with unit (six significant figures)
     * @param inputs  named inputs with sources
     */
    public record StepView(String number, String anchor, String id, String label, String formula, String method,
                           String value, List<StepInputRow> inputs) {
        public StepView {
            inputs = List.copyOf(inputs);
        }
    }

    /** @param sourceAnchor link to the step the input came from, or empty for a cell or a notebook line */
    public record StepInputRow(String name, String value, String source, String sourceAnchor) {
    }
}
