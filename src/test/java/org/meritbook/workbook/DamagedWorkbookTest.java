package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Damaged workbooks must give a located input error (exit code 2), never an internal error: the
 * demo workbook with random bytes overwritten or cut short is read, or refused as CORRUPT_FILE.
 */
class DamagedWorkbookTest {
    private static final Path DEMO = Path.of("demo-data/hmf-honey-validation.xlsx");
    private static final DataReference CALIBRATION =
            new DataReference("lab", "Calibration", "A8:F31", "lab!Calibration!A8:F31", 1);

    @TempDir
    Path dir;

    @Test
    void randomDamageIsReadOrRefusedAsCorrupt() throws Exception {
        byte[] original = Files.readAllBytes(DEMO);
        SplittableRandom random = new SplittableRandom(7);
        int read = 0;
        int refused = 0;
        for (int round = 0; round < 300; round++) {
            byte[] damaged;
            if (round % 5 == 0) {
                damaged = java.util.Arrays.copyOf(original, random.nextInt(original.length));
            } else {
                damaged = original.clone();
                int hits = 1 + random.nextInt(8);
                for (int h = 0; h < hits; h++) {
                    damaged[random.nextInt(damaged.length)] = (byte) random.nextInt(256);
                }
            }
            Path file = dir.resolve("damaged-" + round + ".xlsx");
            Files.write(file, damaged);
            try (WorkbookReader reader = new WorkbookReader()) {
                reader.read(file, CALIBRATION);
                read++;
            } catch (InputException e) {
                refused++;
                if (e.problems().stream().anyMatch(p -> !p.where().startsWith(file.getFileName().toString()))) {
                    throw new AssertionError("an error that does not name the file: " + e.getMessage(), e);
                }
                if (e.key() != ErrorKey.CORRUPT_FILE && e.key() != ErrorKey.MISSING_SHEET && e.key() != ErrorKey.EMPTY_RANGE
                        && e.key() != ErrorKey.WORKBOOK_TOO_LARGE) {
                    throw new AssertionError("unexpected key " + e.key() + ": " + e.getMessage(), e);
                }
            } catch (RuntimeException e) {
                throw new AssertionError("internal error on damaged workbook, round " + round, e);
            }
        }
        assertFalse(refused == 0, "read " + read + ", refused " + refused);
    }
}
