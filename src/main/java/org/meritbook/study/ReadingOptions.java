package org.meritbook.study;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How a cell's data are read where a workbook leaves a choice the reader must not make alone:
 * formulas saved without a result, hidden rows and columns, and a number merged over several cells.
 * The default for each is a located error, so nothing is read that the notebook did not ask for.
 *
 * @param formulas formula cells the workbook holds no result for
 * @param hidden   rows and columns hidden in the workbook
 * @param merged   a number merged over several cells of the block
 */
public record ReadingOptions(Formulas formulas, Hidden hidden, Merged merged) {
    /** The option names, as written in a notebook cell. */
    public static final String FORMULAS = "formulas";
    public static final String HIDDEN = "hidden";
    public static final String MERGED = "merged";

    /** Nothing chosen: every such case is a located error, formulas keep their stored results. */
    public static final ReadingOptions DEFAULT = new ReadingOptions(Formulas.STORED, Hidden.REFUSE, Merged.REFUSE);

    /** A value of one of these options: the word a notebook writes, or null for the default, which has none. */
    public interface Choice {
        String keyword();
    }

    /** {@code formulas:} */
    public enum Formulas implements Choice {
        /** the results the spreadsheet program stored; a formula without one is an error (the default) */
        STORED("stored"),
        /** formulas without a stored result are evaluated by meritbook, each recorded */
        EVALUATE("evaluate");

        private final String keyword;

        Formulas(String keyword) {
            this.keyword = keyword;
        }

        @Override
        public String keyword() {
            return keyword;
        }
    }

    /** {@code hidden:} */
    public enum Hidden implements Choice {
        /** a hidden row or column inside the block is an error (the default; no keyword) */
        REFUSE(null),
        /** hidden rows and columns are read like visible ones, recorded */
        INCLUDE("include"),
        /** hidden rows are left out like excluded points and hidden columns are not read, recorded */
        LEAVE_OUT("leave-out");

        private final String keyword;

        Hidden(String keyword) {
            this.keyword = keyword;
        }

        @Override
        public String keyword() {
            return keyword;
        }
    }

    /** {@code merged:} a number merged over several cells of the block. */
    public enum Merged implements Choice {
        /** an error (the default; no keyword): one value must not become several replicates */
        REFUSE(null),
        /** every cell of the region takes its value (a nominal level written once for its replicates) */
        REPEAT("repeat"),
        /** the value belongs to the region's first cell; its other rows are left out, recorded */
        ONCE("once");

        private final String keyword;

        Merged(String keyword) {
            this.keyword = keyword;
        }

        @Override
        public String keyword() {
            return keyword;
        }
    }

    public ReadingOptions {
        Objects.requireNonNull(formulas, "formulas");
        Objects.requireNonNull(hidden, "hidden");
        Objects.requireNonNull(merged, "merged");
    }

    public ReadingOptions withFormulas(Formulas f) {
        return new ReadingOptions(f, hidden, merged);
    }

    public ReadingOptions withHidden(Hidden h) {
        return new ReadingOptions(formulas, h, merged);
    }

    public ReadingOptions withMerged(Merged m) {
        return new ReadingOptions(formulas, hidden, m);
    }

    /** The keywords a notebook may write for each option, for {@link OptionRules}. */
    static Map<String, List<String>> choices() {
        return Map.of(
                FORMULAS, keywords(Formulas.values()),
                HIDDEN, keywords(Hidden.values()),
                MERGED, keywords(Merged.values()));
    }

    /**
     * The reading options of a cell's options (already checked by the parser; an unknown word falls
     * back to the default, which is the strict choice).
     */
    public static ReadingOptions of(Map<String, OptionValue> options) {
        return new ReadingOptions(
                pick(options, FORMULAS, Formulas.values(), Formulas.STORED),
                pick(options, HIDDEN, Hidden.values(), Hidden.REFUSE),
                pick(options, MERGED, Merged.values(), Merged.REFUSE));
    }

    private static <E extends Choice> E pick(Map<String, OptionValue> options, String name, E[] values, E fallback) {
        OptionValue v = options.get(name);
        if (v == null || !v.isScalar()) {
            return fallback;
        }
        return Arrays.stream(values).filter(e -> v.text().equals(e.keyword())).findFirst().orElse(fallback);
    }

    private static List<String> keywords(Choice[] values) {
        return Arrays.stream(values).map(Choice::keyword).filter(Objects::nonNull).toList();
    }
}
