package org.meritbook.workbook;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;

/**
 * Every test of {@link NumericColumnTest} again, with every sheet that holds a cell read by streaming
 * ({@link SheetStreams}) instead of through POI's usermodel: the same blocks, values, decisions and
 * located errors, asserted by the same assertions.
 */
class StreamedNumericColumnTest extends NumericColumnTest {
    @BeforeAll
    static void streamEverySheet() {
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, "0");
    }

    @AfterAll
    static void streamLargeSheetsOnly() {
        System.clearProperty(SheetStreams.THRESHOLD_PROPERTY);
    }
}
