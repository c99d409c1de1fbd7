package org.meritbook.dossier;

/**
 * What the dossier states about the machine it was rendered on. An input like any other, so tests
 * and reproducibility checks can pin it.
 */
public record RenderEnvironment(String javaRuntime, String operatingSystem) {
    public static RenderEnvironment current() {
        return new RenderEnvironment(
                System.getProperty("java.runtime.name", "Java") + " " + System.getProperty("java.version", "?")
                        + " (" + System.getProperty("java.vendor", "?") + ")",
                System.getProperty("os.name", "?") + " " + System.getProperty("os.arch", "?"));
    }
}
