package org.meritbook.pipeline;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Properties;
import org.meritbook.pipeline.StudyResults.SoftwareComponent;

/**
 * The software that computed and rendered a dossier, for its "software and environment" page:
 * meritbook's own version and the versions of the libraries that do the work, read from the Maven
 * metadata each library's jar carries (META-INF/maven/…/pom.properties).
 */
public final class SoftwareInventory {
    private SoftwareInventory() {
    }

    public static List<SoftwareComponent> components() {
        return List.of(
                new SoftwareComponent("meritbook", ownVersion()),
                new SoftwareComponent("Java runtime", System.getProperty("java.vendor") + " "
                        + System.getProperty("java.runtime.version")),
                // Recorded so that verify renders the environment page the dossier shows, wherever it runs.
                new SoftwareComponent("Operating system", System.getProperty("os.name") + " "
                        + System.getProperty("os.arch")),
                library("Apache Commons Math", "org.apache.commons", "commons-math3"),
                // POI and FreeMarker carry no Maven metadata in their jars but report their own versions.
                new SoftwareComponent("Apache POI", org.apache.poi.Version.getVersion()),
                library("Apache PDFBox", "org.apache.pdfbox", "pdfbox"),
                library("openhtmltopdf", "io.github.openhtmltopdf", "openhtmltopdf-pdfbox"),
                library("XChart", "org.knowm.xchart", "xchart"),
                new SoftwareComponent("Apache FreeMarker", freemarker.template.Configuration.getVersion().toString()));
    }

    /** The jar manifest's Implementation-Version, or "development build" when run from classes. */
    public static String ownVersion() {
        String v = SoftwareInventory.class.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }

    private static SoftwareComponent library(String name, String group, String artifact) {
        String resource = "/META-INF/maven/" + group + "/" + artifact + "/pom.properties";
        try (InputStream in = SoftwareInventory.class.getResourceAsStream(resource)) {
            if (in == null) {
                return new SoftwareComponent(name, "version not recorded in its jar");
            }
            Properties p = new Properties();
            p.load(in);
            return new SoftwareComponent(name, p.getProperty("version", "version not recorded in its jar"));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + resource, e);
        }
    }
}
