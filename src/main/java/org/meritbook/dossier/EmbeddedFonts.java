package org.meritbook.dossier;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FSFontUseCase;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;

/**
 * The fonts every PDF embeds: DejaVu Sans and Sans Mono from the jasperreports-fonts jar on the
 * classpath (never the system's fonts, so output does not depend on the machine), plus any
 * {@code fonts/*.ttf} in a lab's template folder, registered as final fallbacks (e.g. for CJK text,
 * which DejaVu does not cover). PDF/A needs every glyph drawn from an embedded font.
 */
final class EmbeddedFonts {
    static final String DEJAVU = "/net/sf/jasperreports/fonts/dejavu/";

    /** One font file and how CSS names it. */
    record FontFile(String family, int weight, FontStyle style, byte[] bytes, boolean fallback) {
    }

    private final List<FontFile> fonts;

    EmbeddedFonts(Optional<Path> templateDir) {
        List<FontFile> list = new ArrayList<>();
        list.add(bundled("DejaVu Sans", 400, FontStyle.NORMAL, "DejaVuSans.ttf", true));
        list.add(bundled("DejaVu Sans", 700, FontStyle.NORMAL, "DejaVuSans-Bold.ttf", false));
        list.add(bundled("DejaVu Sans", 400, FontStyle.OBLIQUE, "DejaVuSans-Oblique.ttf", false));
        list.add(bundled("DejaVu Sans", 700, FontStyle.OBLIQUE, "DejaVuSans-BoldOblique.ttf", false));
        list.add(bundled("DejaVu Sans Mono", 400, FontStyle.NORMAL, "DejaVuSansMono.ttf", false));
        list.add(bundled("DejaVu Sans Mono", 700, FontStyle.NORMAL, "DejaVuSansMono-Bold.ttf", false));
        templateDir.map(d -> d.resolve("fonts")).filter(Files::isDirectory).ifPresent(d -> list.addAll(labFonts(d)));
        fonts = List.copyOf(list);
    }

    List<FontFile> files() {
        return fonts;
    }

    void register(PdfRendererBuilder builder) {
        for (FontFile f : fonts) {
            byte[] bytes = f.bytes();
            builder.useFont(() -> new ByteArrayInputStream(bytes), f.family(), f.weight(), f.style(), true,
                    EnumSet.of(FSFontUseCase.DOCUMENT, FSFontUseCase.SVG));
            if (f.fallback()) {
                // A separate registration: mixing the fallback use case into the one above hides the
                // face from normal family matching (all text then came out in the bold face).
                builder.useFont(() -> new ByteArrayInputStream(bytes), f.family() + " fallback", f.weight(),
                        f.style(), true, EnumSet.of(FSFontUseCase.FALLBACK_FINAL));
            }
        }
    }

    private static FontFile bundled(String family, int weight, FontStyle style, String file, boolean fallback) {
        try (InputStream in = EmbeddedFonts.class.getResourceAsStream(DEJAVU + file)) {
            if (in == null) {
                throw new IllegalStateException("font " + DEJAVU + file + " is not on the classpath "
                        + "(net.sf.jasperreports:jasperreports-fonts)");
            }
            return new FontFile(family, weight, style, FontTables.without(in.readAllBytes(), "GSUB"), fallback);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Lab fonts in name order (stable output); the family is the file name without extension. */
    private static List<FontFile> labFonts(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            List<FontFile> out = new ArrayList<>();
            for (Path p : s.filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".ttf"))
                    .sorted().toList()) {
                String name = p.getFileName().toString();
                out.add(new FontFile(name.substring(0, name.length() - 4), 400, FontStyle.NORMAL,
                        FontTables.without(Files.readAllBytes(p), "GSUB"), true));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
