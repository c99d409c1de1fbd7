package org.meritbook.workbook;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import java.util.zip.CRC32;
import java.util.zip.Deflater;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

/**
 * An .xlsx taken apart into its zip entries, edited as text, and put together again, also wrongly
 * on purpose: sizes that lie, entries listed twice, a zip bomb. The zip is written by hand
 * ({@link Raw}) so every header field is under the test's control. Immutable: each edit returns a
 * new value, so one parsed workbook serves many mutations.
 */
public final class XlsxParts {
    private final Map<String, byte[]> entries;

    private XlsxParts(Map<String, byte[]> entries) {
        this.entries = entries;
    }

    public static XlsxParts of(byte[] xlsx) {
        Map<String, byte[]> entries = new LinkedHashMap<>();
        try (ZipInputStream in = new ZipInputStream(new java.io.ByteArrayInputStream(xlsx))) {
            ZipEntry e;
            while ((e = in.getNextEntry()) != null) {
                entries.put(e.getName(), in.readAllBytes());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new XlsxParts(entries);
    }

    public List<String> names() {
        return List.copyOf(entries.keySet());
    }

    public String text(String name) {
        byte[] b = entries.get(name);
        if (b == null) {
            throw new IllegalArgumentException("no entry " + name + " in " + entries.keySet());
        }
        return new String(b, StandardCharsets.UTF_8);
    }

    public byte[] bytes(String name) {
        return entries.get(name).clone();
    }

    public XlsxParts with(String name, String text) {
        return with(name, text.getBytes(StandardCharsets.UTF_8));
    }

    public XlsxParts with(String name, byte[] bytes) {
        Map<String, byte[]> copy = new LinkedHashMap<>(entries);
        copy.put(name, bytes.clone());
        return new XlsxParts(copy);
    }

    public XlsxParts edit(String name, UnaryOperator<String> edit) {
        return with(name, edit.apply(text(name)));
    }

    /** The zip as a spreadsheet program writes it: every entry deflated, sizes and CRCs true. */
    public byte[] zip() {
        Raw raw = new Raw();
        entries.forEach((name, data) -> raw.add(Raw.Entry.deflated(name, data)));
        return raw.bytes();
    }

    /** The raw entries, for writing a zip with damaged headers. */
    public List<Raw.Entry> rawEntries() {
        List<Raw.Entry> out = new ArrayList<>();
        entries.forEach((name, data) -> out.add(Raw.Entry.deflated(name, data)));
        return out;
    }

    /** A hand-written zip: local headers, data, central directory, end record. */
    public static final class Raw {
        private final List<Entry> entries = new ArrayList<>();

        /**
         * One entry as written.
         *
         * @param name         entry name
         * @param data         the bytes stored (deflated or not)
         * @param method       0 stored, 8 deflated
         * @param crc          the CRC-32 written in both headers
         * @param size         the uncompressed size written in both headers
         * @param inDirectory  whether the central directory lists it
         */
        public record Entry(String name, byte[] data, int method, long crc, long size, boolean inDirectory) {
            public static Entry deflated(String name, byte[] content) {
                CRC32 crc = new CRC32();
                crc.update(content);
                return new Entry(name, deflate(content), 8, crc.getValue(), content.length, true);
            }

            public Entry withSize(long declared) {
                return new Entry(name, data, method, crc, declared, inDirectory);
            }

            public Entry withCrc(long declared) {
                return new Entry(name, data, method, declared, size, inDirectory);
            }

            public Entry unlisted() {
                return new Entry(name, data, method, crc, size, false);
            }
        }

        public Raw add(Entry e) {
            entries.add(e);
            return this;
        }

        public byte[] bytes() {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ByteArrayOutputStream dir = new ByteArrayOutputStream();
            int listed = 0;
            for (Entry e : entries) {
                int offset = out.size();
                byte[] name = e.name().getBytes(StandardCharsets.UTF_8);
                int32(out, 0x04034b50);
                int16(out, 20);
                int16(out, 0x0800); // UTF-8 names
                int16(out, e.method());
                int16(out, 0);
                int16(out, 0x21); // 1980-01-01
                int32(out, (int) e.crc());
                int32(out, e.data().length);
                int32(out, (int) e.size());
                int16(out, name.length);
                int16(out, 0);
                out.writeBytes(name);
                out.writeBytes(e.data());
                if (!e.inDirectory()) {
                    continue;
                }
                listed++;
                int32(dir, 0x02014b50);
                int16(dir, 20);
                int16(dir, 20);
                int16(dir, 0x0800);
                int16(dir, e.method());
                int16(dir, 0);
                int16(dir, 0x21);
                int32(dir, (int) e.crc());
                int32(dir, e.data().length);
                int32(dir, (int) e.size());
                int16(dir, name.length);
                int16(dir, 0);
                int16(dir, 0);
                int16(dir, 0);
                int16(dir, 0);
                int32(dir, 0);
                int32(dir, offset);
                dir.writeBytes(name);
            }
            int dirOffset = out.size();
            out.writeBytes(dir.toByteArray());
            int32(out, 0x06054b50);
            int16(out, 0);
            int16(out, 0);
            int16(out, listed);
            int16(out, listed);
            int32(out, dir.size());
            int32(out, dirOffset);
            int16(out, 0);
            return out.toByteArray();
        }

        private static void int16(ByteArrayOutputStream o, int v) {
            o.write(v & 0xff);
            o.write((v >>> 8) & 0xff);
        }

        private static void int32(ByteArrayOutputStream o, int v) {
            int16(o, v & 0xffff);
            int16(o, (v >>> 16) & 0xffff);
        }
    }

    /** Raw deflate (no zlib header), as zip entries hold it. */
    public static byte[] deflate(byte[] content) {
        Deflater d = new Deflater(Deflater.DEFAULT_COMPRESSION, true);
        try {
            d.setInput(content);
            d.finish();
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            byte[] buf = new byte[8192];
            while (!d.finished()) {
                out.write(buf, 0, d.deflate(buf));
            }
            return out.toByteArray();
        } finally {
            d.end();
        }
    }

    /**
     * The raw deflate stream of {@code megabytes} MB of the same byte, made chunk by chunk so the
     * content itself is never held in memory: the payload of a zip bomb (about 1000-fold).
     */
    public static byte[] deflatedRepeats(int megabytes, byte value) {
        Deflater d = new Deflater(Deflater.BEST_COMPRESSION, true);
        try {
            byte[] chunk = new byte[1 << 20];
            java.util.Arrays.fill(chunk, value);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            byte[] buf = new byte[64 * 1024];
            for (int i = 0; i < megabytes; i++) {
                d.setInput(chunk);
                while (!d.needsInput()) {
                    out.write(buf, 0, d.deflate(buf));
                }
            }
            d.finish();
            while (!d.finished()) {
                out.write(buf, 0, d.deflate(buf));
            }
            return out.toByteArray();
        } finally {
            d.end();
        }
    }
}
