package org.meritbook.workbook;

import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * For a test class re-running a reader test with every sheet that holds a cell read by streaming
 * ({@link SheetStreams}) instead of through POI's usermodel: sets the streaming threshold to 0 before
 * the class's tests and restores the default (large sheets only) after them.
 */
final class EverySheetStreamed implements BeforeAllCallback, AfterAllCallback {
    @Override
    public void beforeAll(ExtensionContext context) {
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, "0");
    }

    @Override
    public void afterAll(ExtensionContext context) {
        System.clearProperty(SheetStreams.THRESHOLD_PROPERTY);
    }
}
