package org.meritbook.dossier;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;

/**
 * Removes one table from a TrueType font. Used to drop GSUB before embedding: PDFBox would otherwise
 * set "fi"/"fl" as ligature glyphs whose text is U+FB01/U+FB02, so that searching or copying
 * "fixture" from the PDF fails. Checksums are not recomputed; PDFBox subsets the font and ignores them.
 */
final class FontTables {
    private FontTables() {
    }

    static byte[] without(byte[] ttf, String tag) {
        ByteBuffer in = ByteBuffer.wrap(ttf);
        int version = in.getInt(0);
        int numTables = Short.toUnsignedInt(in.getShort(4));
        List<int[]> kept = new ArrayList<>(); // tag, checksum, offset, length
        for (int i = 0; i < numTables; i++) {
            int rec = 12 + 16 * i;
            int t = in.getInt(rec);
            if (!tagName(t).equals(tag)) {
                kept.add(new int[] {t, in.getInt(rec + 4), in.getInt(rec + 8), in.getInt(rec + 12)});
            }
        }
        if (kept.size() == numTables) {
            return ttf;
        }
        int n = kept.size();
        int size = 12 + 16 * n;
        for (int[] k : kept) {
            size += (k[3] + 3) & ~3;
        }
        ByteBuffer out = ByteBuffer.allocate(size);
        int entrySelector = 31 - Integer.numberOfLeadingZeros(n);
        int searchRange = (1 << entrySelector) * 16;
        out.putInt(version).putShort((short) n).putShort((short) searchRange).putShort((short) entrySelector)
                .putShort((short) (n * 16 - searchRange));
        int offset = 12 + 16 * n;
        for (int[] k : kept) {
            out.putInt(k[0]).putInt(k[1]).putInt(offset).putInt(k[3]);
            offset += (k[3] + 3) & ~3;
        }
        for (int[] k : kept) {
            out.put(ttf, k[2], k[3]);
            out.position((out.position() + 3) & ~3);
        }
        return out.array();
    }

    private static String tagName(int t) {
        return new String(new char[] {(char) (t >>> 24), (char) ((t >>> 16) & 0xFF), (char) ((t >>> 8) & 0xFF),
                (char) (t & 0xFF)});
    }
}
