package org.meritbook.workbook;

import org.junit.jupiter.api.extension.ExtendWith;

/**
 * Every test of {@link ReaderErrorsTest} again, with every sheet that holds a cell read by streaming
 * ({@link SheetStreams}) instead of through POI's usermodel: the same blocks, values, decisions and
 * located errors, asserted by the same assertions.
 */
@ExtendWith(EverySheetStreamed.class)
class StreamedReaderErrorsTest extends ReaderErrorsTest {
}
