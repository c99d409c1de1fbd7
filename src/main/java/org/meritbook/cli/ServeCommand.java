package org.meritbook.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.BindException;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.serve.Browser;
import org.meritbook.serve.LiveSession;
import org.meritbook.serve.ShownProblem;
import org.meritbook.serve.Snapshot;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook serve STUDY.md}: the live notebook on 127.0.0.1, re-run on every save. */
@Command(name = "serve", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Preview a study notebook in the browser (127.0.0.1 unless --bind), re-running it whenever the "
                + "notebook or a workbook it declares is saved. Points can be excluded or restored and a revision issued "
                + "from the page; workbooks are never written.")
final class ServeCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY.md", description = "The study notebook.")
    Path notebook;

    @Option(names = "--port", paramLabel = "N", defaultValue = "8765",
            description = "Port (default ${DEFAULT-VALUE}; 0 picks a free one).")
    int port;

    @Option(names = "--bind", paramLabel = "ADDRESS",
            description = "Listen on this address instead of 127.0.0.1 (others on the network can then reach the "
                    + "preview with the printed address and its token).")
    String bind;

    @Option(names = "--open", description = "Open the preview in the default browser, where there is one.")
    boolean open;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "out",
            description = "The output folder 'run' writes into (default: ${DEFAULT-VALUE}): the preview shows the "
                    + "revision history and the changes since the latest revision in DIR/<study>/, as run would, and "
                    + "'Issue revision' publishes there.")
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
        InetAddress address = null;
        if (bind != null) {
            try {
                address = InetAddress.getByName(bind);
            } catch (UnknownHostException e) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, "--bind " + bind, "an address of this machine",
                        "'" + bind + "', which does not resolve", "Give an IP address such as 192.168.1.20, or leave --bind out.");
            }
        }
        LiveSession session;
        Optional<Path> lab = Optional.ofNullable(templates);
        // Parsed workbooks kept from one re-run to the next: a save of the notebook alone parses no workbook.
        StudyRunner runner = StudyRunner.withBuiltInAnalyses().keepingWorkbooks();
        try {
            session = LiveSession.start(notebook, new LiveSession.Options(address, port, out),
                    PublishingSequence.standard(lab, runner), s -> report(s, console));
        } catch (BindException e) {
            runner.close();
            err.println("meritbook: port " + port + " on " + (bind == null ? "127.0.0.1" : bind)
                    + " is in use or not an address of this machine; choose another with --port N (0 picks a free one)"
                    + (bind == null ? "." : " or another --bind."));
            err.flush();
            return Main.BAD_INPUT;
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            session.close();
            runner.close();
            stopped.countDown();
        }, "meritbook-live-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        console.println("meritbook serve: " + session.uri() + " (Ctrl-C stops; the page writes only the notebook, "
                + "when you exclude, restore or issue)");
        console.flush();
        if (open) {
            Browser.open(session.uri()).ifPresent(note -> {
                console.println("  " + note);
                console.flush();
            });
        }
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
