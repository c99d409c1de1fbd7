package org.meritbook.workbook;

import java.io.IOException;
import java.io.InputStream;

/**
 * An input stream whose single-byte read goes through its chunk read, so that a stream that counts
 * or checks what passes does so in one place ({@link PackageScan.Meter}, {@link SheetStreams}).
 */
abstract class ChunkReadStream extends InputStream {
    @Override
    public final int read() throws IOException {
        byte[] one = new byte[1];
        int n = read(one, 0, 1);
        return n < 0 ? -1 : one[0] & 0xff;
    }

    @Override
    public abstract int read(byte[] b, int off, int len) throws IOException;
}
