package org.meritbook.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.AtomicFiles;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.study.DataReference;
import org.meritbook.study.ReadingOptions;
import org.meritbook.study.StarterNotebook;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.WorkbookContents;
import org.meritbook.workbook.WorkbookReader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook new WORKBOOK}: a starter notebook from the workbook's data blocks. */
@Command(name = "new", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Write a starter study notebook for a workbook: one section per data block found "
                + "(Excel tables, then the first table-like block of each other sheet).")
final class NewCommand implements Callable<Integer> {
    @Parameters(paramLabel = "WORKBOOK", description = "The .xlsx, .xls or .csv file.")
    Path workbook;

    @Option(names = {"-o", "--out"}, paramLabel = "STUDY.md",
            description = "The notebook to write (default: the workbook's name with .md, beside it); never overwritten.")
    Path notebook;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Path target = notebook != null ? notebook : workbook.resolveSibling(stem(workbook) + ".md");
        if (Files.exists(target)) {
            throw new InputException(ErrorKey.OUTPUT_EXISTS, target.toString(), "a notebook file that does not exist yet",
                    "an existing file", "Choose another name with -o; an existing notebook is never overwritten.");
        }
        String alias = "lab";
        List<StarterNotebook.Block> blocks = new ArrayList<>();
        List<String> skipped = new ArrayList<>();
        Map<String, List<String>> choices = new LinkedHashMap<>(); // per block reference: reading options to decide
        try (WorkbookReader reader = new WorkbookReader()) {
            WorkbookContents contents = reader.contents(workbook);
            List<String> covered = new ArrayList<>(); // sheets whose data a table or a defined name already names
            for (String table : contents.tables()) {
                DataBlock b = read(reader, reference(alias, table), choices);
                covered.add(b.sheet());
                blocks.add(block(alias + "!" + table, "Table " + table, b));
            }
            for (String name : contents.definedNames()) {
                try {
                    DataBlock b = read(reader, reference(alias, name), choices);
                    covered.add(b.sheet());
                    blocks.add(block(alias + "!" + name, "Named range " + name, b));
                } catch (InputException e) {
                    // A name that is not one block of data (a constant, several areas) is not a data block.
                    skipped.add("defined name " + name + " (" + e.key() + ")");
                }
            }
            for (String sheet : contents.sheets()) {
                if (covered.contains(sheet)) {
                    continue;
                }
                try {
                    DataBlock b = read(reader, reference(alias, sheet), choices);
                    String ref = alias + "!" + quoted(sheet) + "!" + b.range();
                    List<String> toDecide = choices.remove(alias + "!" + sheet);
                    if (toDecide != null) {
                        choices.put(ref, toDecide);
                    }
                    blocks.add(block(ref, sheet, b));
                } catch (InputException e) {
                    if (e.key() != ErrorKey.EMPTY_RANGE) {
                        throw e;
                    }
                    // A sheet of notes or a title page: said in the notebook, with the reader's reason.
                    skipped.add("sheet " + sheet + " (" + e.problems().get(0).found() + ")");
                }
            }
        }
        String relative = target.toAbsolutePath().getParent().relativize(workbook.toAbsolutePath()).toString();
        String text = withChoices(StarterNotebook.render(alias, relative, blocks, skipped,
                StudyRunner.withBuiltInAnalyses().kinds()), choices);
        AtomicFiles.write(target, text.getBytes(StandardCharsets.UTF_8));
        spec.commandLine().getOut().println("meritbook: wrote " + target + " (" + blocks.size() + " data block"
                + (blocks.size() == 1 ? "" : "s") + "); edit it, then: meritbook run " + target);
        spec.commandLine().getOut().flush();
        return Main.DONE;
    }

    /** What the workbook leaves for the notebook to decide (DESIGN §7: never decided silently). */
    private static final Map<ErrorKey, String> CHOICES = Map.of(
            ErrorKey.FORMULA_WITHOUT_RESULT, "# formulas: evaluate      # formulas saved without their results: recalculate the "
                    + "workbook in a spreadsheet program, or let meritbook evaluate them",
            ErrorKey.HIDDEN_CELLS, "# hidden: include          # the workbook hides rows or columns of this block: include | leave-out",
            ErrorKey.MERGED_VALUE, "# merged: repeat           # a number is merged over several rows: repeat (holds for each) | once");

    /**
     * Reads a block; when the only problems are choices the notebook must make (formulas without
     * results, hidden rows, merged numbers), reads it again leniently to list its columns and notes
     * the choices, which the starter shows commented out: {@code meritbook run} insists on them.
     */
    private DataBlock read(WorkbookReader reader, DataReference ref, Map<String, List<String>> choices) {
        try {
            return reader.read(workbook, ref);
        } catch (InputException e) {
            if (!e.problems().stream().allMatch(p -> CHOICES.containsKey(p.key()))) {
                throw e;
            }
            DataBlock b = reader.read(workbook, ref.withReading(new ReadingOptions(ReadingOptions.Formulas.EVALUATE,
                    ReadingOptions.Hidden.INCLUDE, ReadingOptions.Merged.REPEAT)));
            choices.put(ref.text(), e.problems().stream().map(p -> CHOICES.get(p.key())).distinct().toList());
            return b;
        }
    }

    /** The commented-out reading options after each block's reference line. */
    private static String withChoices(String notebook, Map<String, List<String>> choices) {
        String text = notebook;
        for (Map.Entry<String, List<String>> c : choices.entrySet()) {
            String lines = String.join("\n", c.getValue()) + "\n";
            text = text.replace("data: " + c.getKey() + "\n", "data: " + c.getKey() + "\n" + lines);
        }
        return text;
    }

    private static DataReference reference(String alias, String target) {
        return new DataReference(alias, target, null, alias + "!" + target, 0);
    }

    private static StarterNotebook.Block block(String reference, String title, DataBlock b) {
        List<StarterNotebook.BlockColumn> columns = new ArrayList<>();
        for (Column c : b.columns()) {
            boolean numeric = !c.values().isEmpty() && c.values().stream().allMatch(CellValue::isNumber);
            columns.add(new StarterNotebook.BlockColumn(c.header(), c.name(), c.letter(), numeric));
        }
        return new StarterNotebook.Block(reference, title, b.rowCount(), columns);
    }

    private static String quoted(String sheet) {
        return sheet.matches("[A-Za-z0-9_]+") ? sheet : "'" + sheet + "'";
    }

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return (dot > 0 ? name.substring(0, dot) : name).toLowerCase(Locale.ROOT);
    }
}
