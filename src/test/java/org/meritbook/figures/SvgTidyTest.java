package org.meritbook.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The hand-written scanners in {@link SvgTidy} (they replaced regular expressions that took a fifth of
 * the dossier's rendering time) must rewrite exactly as the expressions did. Reference: the
 * expressions themselves, run by java.util.regex, on random text made of the characters that matter.
 */
class SvgTidyTest {
    private static final Pattern LONG_DECIMAL = Pattern.compile("-?\\d+\\.\\d{3,}");
    private static final Pattern CLIP_ID = Pattern.compile("\\bclip-?\\d+\\b");
    private static final String ALPHABET = "clip-0123456789.. _\"#()aé";

    @Test
    void roundsDecimalsAsTheExpressionDid() {
        assertEquals("M 1.23 L -0.5 0 7.1 12.34 url(#clip3)",
                SvgTidy.roundDecimals("M 1.2345 L -0.4999 -0.0001 7.1 12.34 url(#clip3)"));
        Random random = new Random(13);
        for (int i = 0; i < 20_000; i++) {
            String s = randomText(random);
            assertEquals(referenceRound(s), SvgTidy.roundDecimals(s), s);
        }
    }

    @Test
    void renumbersClipIdsAsTheExpressionDid() {
        assertEquals("f-clip1 clip-path f-clip2 f-clip1 clip12a xclip3",
                SvgTidy.renumberClips("clip7 clip-path clip-8 clip7 clip12a xclip3", "f"));
        Random random = new Random(17);
        for (int i = 0; i < 20_000; i++) {
            String s = randomText(random);
            assertEquals(referenceClips(s, "f"), SvgTidy.renumberClips(s, "f"), s);
        }
    }

    private static String randomText(Random random) {
        StringBuilder b = new StringBuilder();
        int length = random.nextInt(40);
        for (int i = 0; i < length; i++) {
            if (random.nextInt(6) == 0) {
                b.append("clip");
            } else {
                b.append(ALPHABET.charAt(random.nextInt(ALPHABET.length())));
            }
        }
        return b.toString();
    }

    private static String referenceRound(String svg) {
        Matcher m = LONG_DECIMAL.matcher(svg);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            BigDecimal v = new BigDecimal(m.group()).setScale(2, RoundingMode.HALF_UP).stripTrailingZeros();
            m.appendReplacement(out, v.signum() == 0 ? "0" : v.toPlainString());
        }
        m.appendTail(out);
        return out.toString();
    }

    private static String referenceClips(String svg, String prefix) {
        Map<String, String> ids = new LinkedHashMap<>();
        Matcher m = CLIP_ID.matcher(svg);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            String id = ids.computeIfAbsent(m.group(), k -> prefix + "-clip" + (ids.size() + 1));
            m.appendReplacement(out, Matcher.quoteReplacement(id));
        }
        m.appendTail(out);
        return out.toString();
    }
}
