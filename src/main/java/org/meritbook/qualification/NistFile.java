package org.meritbook.qualification;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Reading NIST's .dat layout: the shipped resource's lines, the line ranges its header names. */
final class NistFile {
    private NistFile() {
    }

    /** The lines of {@code nist-strd/<name>.dat} beside this class (LF or CRLF line ends). */
    static List<String> lines(String name) {
        String resource = "nist-strd/" + name + ".dat";
        try (InputStream in = NistFile.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + resource);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII));
            return reader.lines().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The 1-based inclusive line range the first header line matching {@code pattern} names (groups 1 and 2). */
    static int[] range(List<String> lines, Pattern pattern) {
        for (String line : lines) {
            Matcher m = pattern.matcher(line);
            if (m.find()) {
                return new int[] {Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))};
            }
        }
        throw new IllegalStateException("header line not found: " + pattern);
    }

    /** The lines of a 1-based inclusive range. */
    static List<String> slice(List<String> lines, int[] range) {
        return lines.subList(range[0] - 1, range[1]);
    }

    /** The first match of {@code pattern} among {@code lines}, or an error naming what is missing. */
    static Matcher find(String name, List<String> lines, Pattern pattern, String what) {
        for (String line : lines) {
            Matcher m = pattern.matcher(line);
            if (m.matches()) {
                return m;
            }
        }
        throw new IllegalStateException(name + ": certified " + what + " not found");
    }

    static double number(String text) {
        return Double.parseDouble(text);
    }

    /**
     * The values less an exact decimal centre, each rounded once to a double. A sum of squares or SD
     * does not change under a shift, and the shift done in decimal removes the constant leading
     * digits (up to 13 in NIST's SmLs07–09) that a double cannot carry beside the varying ones.
     */
    static double[] centred(List<BigDecimal> values, BigDecimal centre) {
        return values.stream().mapToDouble(v -> v.subtract(centre).doubleValue()).toArray();
    }
}
