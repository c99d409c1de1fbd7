package org.meritbook.pipeline;

import java.util.List;
import org.meritbook.pipeline.StudyResults.SoftwareComponent;

/**
 * The software that computed and rendered a dossier, for its "software and environment" page:
 * meritbook's own version and the versions of the libraries that do the work, read from their jar
 * manifests.
 */
public final class SoftwareInventory {
    private SoftwareInventory() {
    }

    public static List<SoftwareComponent> components() {
        return List.of(
                new SoftwareComponent("meritbook", versionOf(SoftwareInventory.class)),
                new SoftwareComponent("Java runtime", System.getProperty("java.vendor") + " "
                        + System.getProperty("java.runtime.version")),
                new SoftwareComponent("Apache Commons Math", versionOf(org.apache.commons.math3.util.FastMath.class)),
                new SoftwareComponent("Apache POI", org.apache.poi.Version.getVersion()),
                new SoftwareComponent("Apache PDFBox", versionOf(org.apache.pdfbox.pdmodel.PDDocument.class)),
                new SoftwareComponent("openhtmltopdf", versionOf(
                        com.openhtmltopdf.pdfboxout.PdfRendererBuilder.class)),
                new SoftwareComponent("XChart", versionOf(org.knowm.xchart.XYChart.class)),
                new SoftwareComponent("Apache FreeMarker", freemarker.template.Configuration.getVersion().toString()));
    }

    /** The jar manifest's Implementation-Version, or "development build" when run from classes. */
    static String versionOf(Class<?> type) {
        String v = type.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }
}
