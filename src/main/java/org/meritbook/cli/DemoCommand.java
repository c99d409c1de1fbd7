package org.meritbook.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code meritbook demo}: run the bundled demo study in demo-data/. */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Run the bundled demo study (demo-data/) and write its results into DIR/<study>/ (-o).")
final class DemoCommand implements Callable<Integer> {
    @CommandLine.Mixin
    OutputOptions output;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return StudyOutput.runAndWrite(demoNotebook(), output, spec.commandLine().getOut());
    }

    /** The one notebook in demo-data/, found under the installation folder the launcher names. */
    static Path demoNotebook() {
        Path home = Path.of(System.getProperty("meritbook.home", "."));
        Path folder = home.resolve("demo-data");
        try (Stream<Path> files = Files.list(folder)) {
            List<Path> notebooks = files.filter(p -> p.getFileName().toString().endsWith(".md"))
                    .filter(p -> !p.getFileName().toString().equals("README.md")).sorted().toList();
            if (notebooks.size() != 1) {
                throw new IllegalStateException("expected exactly one demo notebook in " + folder + ", found "
                        + notebooks);
            }
            return notebooks.get(0);
        } catch (IOException e) {
            throw new UncheckedIOException("the demo data folder " + folder + " cannot be read", e);
        }
    }
}
