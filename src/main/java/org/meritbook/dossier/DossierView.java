package org.meritbook.dossier;

import java.util.List;
import java.util.function.UnaryOperator;

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
public record DossierView(boolean pdf, Cover cover, List<RevisionRow> revisions, Changes changes, List<TocEntry> contents,
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
        return new DossierView(asPdf, cover, revisions, changes, contents, summary, intro, sections, closing, trail, inputs,
                software, notes);
    }

    /** The same view with each figure's markup passed through {@code art} (placeholder to drawing). */
    DossierView withFigureMarkup(UnaryOperator<Markup> art) {
        return new DossierView(pdf, cover, revisions, changes, contents, summary, intro,
                sections.stream().map(s -> s.withFigureMarkup(art)).toList(), closing, trail, inputs, software, notes);
    }

    /**
     * Changes since the latest earlier revision whose dossier was found beside this one.
     *
     * @param present whether an earlier dossier was found
     * @param since   e.g. "revision 1 (study-rev1.pdf)"
     * @param groups  input files, input cells, settings, results; empty groups left out
     */
    public record Changes(boolean present, String since, List<ChangeGroup> groups) {
        public Changes {
            groups = List.copyOf(groups);
        }
    }

    /** One kind of change, e.g. "Input cells", with its rows. */
    public record ChangeGroup(String title, List<ChangeRow> rows) {
        public ChangeGroup {
            rows = List.copyOf(rows);
        }
    }

    /** What changed, from what, to what ("—" for added or removed). */
    public record ChangeRow(String what, String before, String after) {
    }

    /** Cover page and running header fields. */
    /**
     * A review or an approval as the front matter records it ({@code reviewed-by}, {@code reviewed-on});
     * empty on the cover when the document does not carry it.
     */
    public record SignOff(String name, String date) {
        public static final SignOff NONE = new SignOff("", "");
    }

    public record Cover(String title, String method, String laboratory, String revision, String date,
                        String preparedBy, String status, String outcome, String criteria, String documentId,
                        SignOff reviewed, SignOff approved) {
        /** A cover without sign-offs beyond preparation. */
        public Cover(String title, String method, String laboratory, String revision, String date, String preparedBy,
                     String status, String outcome, String criteria, String documentId) {
            this(title, method, laboratory, revision, date, preparedBy, status, outcome, criteria, documentId,
                    SignOff.NONE, SignOff.NONE);
        }

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

    /** @param warnings warnings about the study as a whole (e.g. a declared source no cell reads) */
    public record Summary(String number, List<SummaryRow> rows, String counts, Profile profile, List<String> warnings) {
        public Summary {
            rows = List.copyOf(rows);
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * The acceptance profile the verdicts come from.
     *
     * @param present     whether the notebook named one
     * @param heading     e.g. "linearity-basic (built in)"
     * @param description what it is for
     * @param rules       its rules with their sources
     */
    public record Profile(boolean present, String heading, String description, List<ProfileRule> rules) {
        public Profile {
            rules = List.copyOf(rules);
        }
    }

    /** One rule of the profile and where its limit comes from. */
    public record ProfileRule(String rule, String source) {
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

    /**
     * One section's part of the calculation trail.
     *
     * @param steps  every step in computation order, each complete (for lab templates that list steps one by one)
     * @param blocks the same steps as laid out: single steps, and runs of steps that share a formula and
     *               input names as one table; every step appears in exactly one block
     */
    public record TrailGroup(String number, String title, String anchor, List<StepView> steps, List<TrailBlock> blocks) {
        public TrailGroup {
            steps = List.copyOf(steps);
            blocks = List.copyOf(blocks);
        }
    }

    /**
     * A piece of the trail as laid out: one step in full ({@code compact} false: {@code step}), or
     * steps sharing one formula and the same input names as one table ({@code compact} true: one row
     * per step; {@code step} is then the first of them).
     *
     * @param label   what the steps compute, without the part that differs per step
     * @param formula the shared formula
     * @param method  the shared method, or empty
     * @param common  inputs with the same value and source in every step, given once
     * @param columns names of the inputs that differ between steps, one column each
     * @param points  true when the rows carry a per-step label ({@link CompactRow#point()})
     * @param rows    one per step, in computation order
     * @param omitted for a block standing for steps not printed ({@link TrailViewBuilder#MAX_SIMILAR_STEPS}), what
     *                it says; empty otherwise. Its anchor is {@code step}'s, so links to those steps land on it
     */
    public record TrailBlock(boolean compact, StepView step, String label, String formula, String method,
                             List<StepInputRow> common, List<String> columns, boolean points, List<CompactRow> rows,
                             String omitted) {
        public TrailBlock {
            common = List.copyOf(common);
            columns = List.copyOf(columns);
            rows = List.copyOf(rows);
            java.util.Objects.requireNonNull(omitted, "omitted");
        }

        /** A block of printed steps. */
        public TrailBlock(boolean compact, StepView step, String label, String formula, String method,
                          List<StepInputRow> common, List<String> columns, boolean points, List<CompactRow> rows) {
            this(compact, step, label, formula, method, common, columns, points, rows, "");
        }
    }

    /**
     * One step as a row of a compact trail table.
     *
     * @param point  the part of the step's label that differs from its neighbours' (e.g. the cell), or empty
     * @param inputs the differing inputs, in {@link TrailBlock#columns()} order
     * @param value  the result with unit
     */
    public record CompactRow(String number, String anchor, String id, String point, List<StepInputRow> inputs,
                             String value) {
        public CompactRow {
            inputs = List.copyOf(inputs);
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
     * @param inputs  named inputs with sources (all of them)
     * @param indexed indexed inputs (x1, y1, w1, x2 …) as a table by index; {@code present} false when the
     *                step has none worth tabulating
     * @param others  the inputs not in {@code indexed} (all inputs when it is absent)
     */
    public record StepView(String number, String anchor, String id, String label, String formula, String method,
                           String value, List<StepInputRow> inputs, IndexedInputs indexed, List<StepInputRow> others) {
        public StepView {
            inputs = List.copyOf(inputs);
            others = List.copyOf(others);
        }
    }

    /**
     * @param sourceAnchor link to the step the input came from, or empty for a cell or a notebook line
     * @param sourceLabel  the source as a short link text: the step's number ("A.1.3") for a step, else the source
     */
    public record StepInputRow(String name, String value, String source, String sourceAnchor, String sourceLabel) {
    }

    /**
     * Inputs named by a symbol and an index ({@code x12}, {@code y[12]}), one row per index and one
     * column per symbol.
     */
    public record IndexedInputs(boolean present, List<IndexColumn> columns, List<IndexRow> rows) {
        public IndexedInputs {
            columns = List.copyOf(columns);
            rows = List.copyOf(rows);
        }
    }

    /** @param source the source shared by every value of the column, or empty when each cell has its own */
    public record IndexColumn(String name, String source, String sourceAnchor) {
    }

    public record IndexRow(String index, List<IndexCell> cells) {
        public IndexRow {
            cells = List.copyOf(cells);
        }
    }

    /** @param value empty when the index has no input of this symbol */
    public record IndexCell(String value, String source, String sourceAnchor) {
    }
}
