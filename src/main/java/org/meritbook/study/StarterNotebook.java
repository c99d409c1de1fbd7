package org.meritbook.study;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Writes a starter study notebook for a workbook: front matter to fill in, one section per data
 * block found, and a cell of the kind its headers suggest — a calibration where they name a
 * concentration and a response, and blanks, spikes, replicates by day or samples as
 * {@link StarterCells} recognises them — each marked as guessed, with why, for the analyst to check. The analyst edits it; nothing is run from a guess
 * unseen, since every choice is written out in the notebook.
 */
public final class StarterNotebook {
    private static final Pattern CONCENTRATION =
            Pattern.compile("(?i).*\\b(conc|concentration|nominal|level|amount|spiked?|std conc|x)\\b.*");
    private static final Pattern RESPONSE =
            Pattern.compile("(?i).*\\b(area|height|signal|response|abs|absorbance|counts|intensity|ratio|y)\\b.*");

    private StarterNotebook() {
    }

    /**
     * A data block found in the workbook.
     *
     * @param reference the data reference to write, e.g. {@code lab!Calibration!A8:F31}
     * @param title     a heading, e.g. the sheet or table name
     * @param rows      data rows
     * @param columns   its columns
     */
    public record Block(String reference, String title, int rows, List<BlockColumn> columns) {
        public Block {
            columns = List.copyOf(columns);
        }
    }

    /**
     * @param header  the header as written
     * @param name    the header without its unit (what the notebook names)
     * @param letter  the sheet column letter
     * @param numeric whether every value is a number
     */
    public record BlockColumn(String header, String name, String letter, boolean numeric) {
    }

    /**
     * @param alias     the source alias
     * @param file      the workbook's file name as the notebook will declare it
     * @param blocks    the blocks found, in workbook order
     * @param skipped   sheets with no table-like block and names that are not one block, said in the notebook
     * @param available the kinds this version runs: a cell of another kind is written as a text block
     */
    public static String render(String alias, String file, List<Block> blocks, List<String> skipped,
                                java.util.Set<AnalysisKind> available) {
        StringBuilder md = new StringBuilder();
        md.append("---\n")
                .append("title: Validation of <analyte> in <matrix> by <technique>   # edit\n")
                .append("method: <method id>\n")
                .append("laboratory: <laboratory>\n")
                .append("revision: 1\n")
                .append("revision-reason: First issue\n")
                .append("prepared-by: <name>\n")
                .append("# date: yyyy-mm-dd            # the revision date; without it, the workbooks' save date\n")
                .append("# criteria: linearity-basic    # an acceptance profile; see docs/criteria.md\n")
                .append("sources:\n")
                .append("  ").append(alias).append(": ").append(file).append('\n')
                .append("---\n\n")
                .append("## Purpose and scope\n\n")
                .append("<What the method measures, in which matrix, over which range, and why this study.>\n");
        // The calibration comes first: the cells that use its line must come below it.
        Block calibrationBlock = blocks.stream().filter(b -> calibration(b).isPresent()).findFirst().orElse(null);
        List<Block> ordered = new java.util.ArrayList<>(blocks);
        if (calibrationBlock != null) {
            ordered.remove(calibrationBlock);
            ordered.add(0, calibrationBlock);
        }
        for (Block b : ordered) {
            md.append("\n## ").append(b.title()).append("\n\n")
                    .append("Data block `").append(b.reference()).append("`: ").append(b.rows())
                    .append(" rows; columns ").append(columnList(b)).append(".\n\n");
            Optional<String> cell = (b == calibrationBlock ? calibration(b)
                    : StarterCells.propose(b, calibrationBlock != null)).map(c -> runnable(c, available));
            md.append(cell.orElse("```text\n# No analysis kind recognised from the headers: name the columns in a cell.\n"
                    + "Available as data: " + b.reference() + "\n```\n"));
        }
        if (!skipped.isEmpty()) {
            md.append("\n<!-- Not offered as data blocks: ").append(String.join(", ", skipped))
                    .append(". -->\n");
        }
        return md.toString();
    }

    /** A proposed cell of a kind this version does not run stays a text block, marked as planned. */
    private static String runnable(String cell, java.util.Set<AnalysisKind> available) {
        String info = cell.substring(3, cell.indexOf('\n'));
        boolean runs = AnalysisKind.fromKeyword(info).map(available::contains).orElse(false);
        return runs ? cell : "```text\n# A " + info + " cell, for when this version runs that kind:\n" + info + "\n"
                + cell.substring(cell.indexOf('\n') + 1);
    }

    /** A calibration cell where the headers name a concentration and a response. */
    private static Optional<String> calibration(Block b) {
        Optional<BlockColumn> x = pick(b, CONCENTRATION, null);
        Optional<BlockColumn> y = x.flatMap(xc -> pick(b, RESPONSE, xc));
        if (x.isEmpty() || y.isEmpty() || StarterCells.looksLikeOtherKind(b)) {
            return Optional.empty();
        }
        return Optional.of("```calibration\n"
                + "# x and y were guessed from the headers (a concentration and a response): check them.\n"
                + "id: calibration\n"
                + "data: " + b.reference() + "\n"
                + "x: " + x.get().name() + "\n"
                + "y: " + y.get().name() + "\n"
                + "weighting: none     # none | 1/x | 1/x^2 | 1/y | 1/y^2 | 1/s^2 | auto\n"
                + "model: linear       # linear | linear-through-origin | quadratic\n"
                + "# exclude:\n#   - cell: Sheet!C17\n#     reason: <why>\n"
                + "```\n");
    }

    private static String columnList(Block b) {
        return String.join(", ", b.columns().stream()
                .map(c -> "`" + c.header() + "` (" + c.letter() + (c.numeric() ? ", numbers" : "") + ")").toList());
    }

    private static Optional<BlockColumn> pick(Block b, Pattern pattern, BlockColumn not) {
        return b.columns().stream().filter(BlockColumn::numeric).filter(c -> c != not)
                .filter(c -> pattern.matcher(c.name().toLowerCase(Locale.ROOT)).matches()).findFirst();
    }
}
