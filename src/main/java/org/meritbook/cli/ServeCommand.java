package org.meritbook.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.BindException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.serve.LiveSession;
import org.meritbook.serve.ShownProblem;
import org.meritbook.serve.Snapshot;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook serve STUDY.md}: the live notebook on 127.0.0.1, re-run on every save; writes nothing. */
@Command(name = "serve", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Preview a study notebook in the browser (127.0.0.1 only), re-running it whenever the notebook "
                + "or a workbook it declares is saved. Writes nothing; issue the dossier with 'meritbook run'.")
final class ServeCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY.md", description = "The study notebook.")
    Path notebook;

    @Option(names = "--port", paramLabel = "N", defaultValue = "8765",
            description = "Port on 127.0.0.1 (default ${DEFAULT-VALUE}; 0 picks a free one).")
    int port;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "out",
            description = "The output folder 'run' writes into (default: ${DEFAULT-VALUE}): the preview shows the "
                    + "revision history and the changes since the latest revision in DIR/<study>/, as run would.")
    Path out;

    @Option(names = "--templates", paramLabel = "DIR",
            description = "Use the dossier templates in DIR (a lab's own copy of report-templates/), as given to run.")
    Path templates;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (!Files.isRegularFile(notebook)) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, notebook.toString(), "a study notebook", "no such file",
                    "Check the path, or write a starter notebook with 'meritbook new WORKBOOK'.");
        }
        PrintWriter console = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        LiveSession session;
        try {
            session = LiveSession.start(notebook, port, PublishingSequence.standard(Optional.ofNullable(templates)),
                    Optional.of(out), s -> report(s, console));
        } catch (BindException e) {
            err.println("meritbook: port " + port + " on 127.0.0.1 is in use; choose another with --port N (0 picks a free one).");
            err.flush();
            return Main.BAD_INPUT;
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            session.close();
            stopped.countDown();
        }, "meritbook-live-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        console.println("meritbook serve: " + session.uri() + " (Ctrl-C stops; nothing is written)");
        console.flush();
        stopped.await();
        return Main.DONE;
    }

    private static void report(Snapshot s, PrintWriter out) {
        if (s.state() == Snapshot.State.OK) {
            out.println("  run " + s.run() + ": up to date (" + s.elapsedMs() + " ms)");
        } else {
            out.println("  run " + s.run() + ": the input needs attention (" + s.problems().size() + " problem"
                    + (s.problems().size() == 1 ? "" : "s") + ")");
            for (ShownProblem p : s.problems()) {
                out.println("    " + p.message());
            }
        }
        out.flush();
    }
}
