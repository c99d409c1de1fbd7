package org.meritbook.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.AtomicFiles;
import org.meritbook.study.DataReference;
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
        try (WorkbookReader reader = new WorkbookReader()) {
            WorkbookContents contents = reader.contents(workbook);
            List<String> covered = new ArrayList<>(); // sheets whose data a table or a defined name already names
            for (String table : contents.tables()) {
                DataBlock b = reader.read(workbook, reference(alias, table));
                covered.add(b.sheet());
                blocks.add(block(alias + "!" + table, "Table " + table, b));
            }
            for (String name : contents.definedNames()) {
                try {
                    DataBlock b = reader.read(workbook, reference(alias, name));
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
                    DataBlock b = reader.read(workbook, reference(alias, sheet));
                    blocks.add(block(alias + "!" + quoted(sheet) + "!" + b.range(), sheet, b));
                } catch (InputException e) {
                    if (e.key() != ErrorKey.EMPTY_RANGE) {
                        throw e;
                    }
                    skipped.add(sheet); // a sheet of notes or a title page: said in the notebook
                }
            }
        }
        String relative = target.toAbsolutePath().getParent().relativize(workbook.toAbsolutePath()).toString();
        AtomicFiles.write(target, StarterNotebook.render(alias, relative, blocks, skipped).getBytes(StandardCharsets.UTF_8));
        spec.commandLine().getOut().println("meritbook: wrote " + target + " (" + blocks.size() + " data block"
                + (blocks.size() == 1 ? "" : "s") + "); edit it, then: meritbook run " + target);
        spec.commandLine().getOut().flush();
        return Main.DONE;
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
