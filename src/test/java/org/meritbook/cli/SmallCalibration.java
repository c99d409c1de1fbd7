package org.meritbook.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Five invented calibration points as a CSV workbook (header "Conc (mg/L)", "Area"), for command tests. */
final class SmallCalibration {
    private SmallCalibration() {
    }

    static Path csv(Path file) throws IOException {
        Files.createDirectories(file.toAbsolutePath().getParent());
        Files.writeString(file, """
                Conc (mg/L),Area
                1,10.2
                2,19.9
                4,40.5
                8,79.4
                16,161.0
                """);
        return file;
    }
}
