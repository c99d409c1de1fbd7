package org.meritbook.serve;

import java.awt.Desktop;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Opens the preview in the default browser for {@code serve --open}: through the desktop where Java
 * has one, else through the system's opener ({@code xdg-open}, {@code open}); on a machine with
 * neither (a server, a container) nothing happens but a note, since the address is printed anyway.
 */
public final class Browser {
    private Browser() {
    }

    /** @return a note for the console when no browser could be opened, else empty */
    public static Optional<String> open(URI uri) {
        try {
            if (!GraphicsEnvironment.isHeadless() && Desktop.isDesktopSupported()
                    && Desktop.getDesktop().isSupported(Desktop.Action.BROWSE)) {
                Desktop.getDesktop().browse(uri);
                return Optional.empty();
            }
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            // fall through to the system's opener
        }
        boolean mac = System.getProperty("os.name", "").toLowerCase(Locale.ROOT).contains("mac");
        String opener = mac ? "open" : "xdg-open";
        Optional<Path> found = onPath(opener);
        if (found.isEmpty()) {
            return Optional.of("no browser to open here (--open): open the address above yourself");
        }
        try {
            new ProcessBuilder(List.of(found.get().toString(), uri.toString())).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            return Optional.empty();
        } catch (IOException e) {
            return Optional.of("the browser could not be opened (" + e.getMessage() + "): open the address above yourself");
        }
    }

    private static Optional<Path> onPath(String command) {
        String path = System.getenv("PATH");
        if (path == null) {
            return Optional.empty();
        }
        for (String dir : path.split(java.io.File.pathSeparator)) {
            Path p = Path.of(dir).resolve(command);
            if (Files.isExecutable(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }
}
