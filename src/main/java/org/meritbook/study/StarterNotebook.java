package org.meritbook.study;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Writes a starter study notebook for a workbook: front matter to fill in, one section per data
 * block found, and a calibration cell where a block's headers name a concentration and a response
 * (marked as guessed, for the analyst to check). The analyst edits it; nothing is run from a guess
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
     */
    public static String render(String alias, String file, List<Block> blocks, List<String> skipped) {
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
        boolean calibrationWritten = false;
        for (Block b : blocks) {
            md.append("\n## ").append(b.title()).append("\n\n")
                    .append("Data block `").append(b.reference()).append("`: ").append(b.rows())
                    .append(" rows; columns ").append(columnList(b)).append(".\n\n");
            Optional<BlockColumn> x = pick(b, CONCENTRATION, null);
            Optional<BlockColumn> y = x.flatMap(xc -> pick(b, RESPONSE, xc));
            if (!calibrationWritten && x.isPresent() && y.isPresent()) {
                calibrationWritten = true;
                md.append("```calibration\n")
                        .append("# x and y were guessed from the headers: check them.\n")
                        .append("data: ").append(b.reference()).append('\n')
                        .append("x: ").append(x.get().name()).append('\n')
                        .append("y: ").append(y.get().name()).append('\n')
                        .append("weighting: none     # none | 1/x | 1/x^2 | 1/y | 1/y^2 | auto\n")
                        .append("model: linear       # linear | linear-through-origin | quadratic\n")
                        .append("# exclude:\n#   - cell: Sheet!C17\n#     reason: <why>\n")
                        .append("```\n");
            } else {
                md.append("```text\n")
                        .append("Available as data: ").append(b.reference()).append('\n')
                        .append("```\n");
            }
        }
        if (!skipped.isEmpty()) {
            md.append("\n<!-- Not offered as data blocks: ").append(String.join(", ", skipped))
                    .append(". -->\n");
        }
        return md.toString();
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
