package org.meritbook.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.concurrent.Callable;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.AtomicFiles;
import org.meritbook.pipeline.SoftwareInventory;
import org.meritbook.qualification.Qualification;
import org.meritbook.qualification.QualificationCheck;
import org.meritbook.qualification.QualificationReport;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code meritbook qualify}: recompute NIST certified values on this machine and keep the record. */
@Command(name = "qualify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Recompute NIST StRD certified values with meritbook's statistics (calibration fits, mean and SD, "
                + "one-way ANOVA) on this machine and "
                + "write a dated qualification record (DIR/qualification/).",
            "Exit 0 when every figure agrees on at least 9 significant digits, 1 otherwise."})
final class QualifyCommand implements Callable<Integer> {
    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "out",
            description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The clock the record is dated by; a qualification record says when it was made. */
    Clock clock = Clock.systemUTC();

    @Override
    public Integer call() {
        Instant now = clock.instant().truncatedTo(ChronoUnit.SECONDS);
        List<QualificationCheck> checks = Qualification.run();
        List<String> environment = List.of(
                "meritbook " + SoftwareInventory.ownVersion(),
                "Java " + System.getProperty("java.runtime.version") + " (" + System.getProperty("java.vendor") + ")",
                "Operating system: " + System.getProperty("os.name") + " " + System.getProperty("os.version") + " "
                        + System.getProperty("os.arch"),
                "Run at " + DateTimeFormatter.ISO_INSTANT.format(now));
        Path record = out.resolve("qualification")
                .resolve("qualification-" + DateTimeFormatter.ISO_INSTANT.format(now).replace(":", "") + ".md");
        if (Files.exists(record)) {
            throw new InputException(ErrorKey.OUTPUT_EXISTS, record.toString(), "a new qualification record",
                    "a record of the same second", "Run it again in a moment; records are never overwritten.");
        }
        AtomicFiles.write(record, QualificationReport.markdown(checks, environment).getBytes(StandardCharsets.UTF_8));
        long failed = checks.stream().filter(c -> !c.passed()).count();
        double least = checks.stream().mapToDouble(QualificationCheck::digits).min().orElseThrow();
        spec.commandLine().getOut().printf("meritbook: qualification %s: %d of %d NIST certified figures reproduced "
                        + "to at least %.0f digits (least %.1f)%n  wrote %s%n", failed == 0 ? "passed" : "FAILED",
                checks.size() - failed, checks.size(), Qualification.REQUIRED_DIGITS, least, record);
        spec.commandLine().getOut().flush();
        return failed == 0 ? Main.DONE : Main.ACCEPTANCE_FAILED;
    }
}
