package org.meritbook.cli;

import org.meritbook.pipeline.SoftwareInventory;
import picocli.CommandLine;

/** {@code meritbook --version}: this build and the runtime it runs on. */
final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        String version = SoftwareInventory.ownVersion();
        return new String[] {"meritbook " + version,
                "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")"};
    }
}
