package org.meritbook.dossier;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.Properties;
import org.meritbook.dossier.DossierView.SoftwareRow;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.figures.SvgChartRenderer;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.revision.RevisionContext;
import org.meritbook.pipeline.InputFile;
import org.meritbook.pipeline.SideTask;
import org.meritbook.study.FrontMatter;

/**
 * Renders a study's results as a validation dossier, HTML and PDF/A-3, from one view-model and one
 * set of templates. A pure function of its inputs (the results, the attached files' bytes, the
 * templates and the {@link RenderEnvironment}): the same inputs give byte-identical output.
 */
public final class DossierRenderer {
    private final SideTask<Parts> parts;
    private final PdfAFinisher finisher = new PdfAFinisher();
    private final FigureCache figures = new FigureCache(new SvgChartRenderer()::render);
    private final String meritbookVersion = Optional.ofNullable(
            DossierRenderer.class.getPackage().getImplementationVersion()).orElse("development build");
    /** Lays out the pages with the drawings already in them: the plain way, kept to test the quick one against. */
    private final boolean figuresInline;

    /** What takes time to set up: the templates, the fonts (read and checked), the colour profile. */
    private record Parts(TemplateEngine templates, DossierModelBuilder model, PdfRenderer pdf) {
        static Parts of(Optional<Path> templateDir, RenderEnvironment environment) {
            return of(templateDir, environment, true);
        }

        static Parts of(Optional<Path> templateDir, RenderEnvironment environment, boolean pruneStyles) {
            return new Parts(new TemplateEngine(templateDir),
                    new DossierModelBuilder(environment, renderingLibraries()),
                    new PdfRenderer(new EmbeddedFonts(templateDir), pruneStyles));
        }
    }

    /** @param templateDir a lab's template folder ({@code --templates DIR}); empty for the defaults */
    public DossierRenderer(Optional<Path> templateDir) {
        this(templateDir, RenderEnvironment.current());
    }

    public DossierRenderer(Optional<Path> templateDir, RenderEnvironment environment) {
        this(templateDir, environment, false, false);
    }

    /**
     * @param figuresInline     lay out the pages with the drawings in them (the plain way)
     * @param wholeStyleSheets  give the PDF renderer every rule of its style sheets (the plain way)
     */
    DossierRenderer(Optional<Path> templateDir, RenderEnvironment environment, boolean figuresInline,
                    boolean wholeStyleSheets) {
        this.figuresInline = figuresInline;
        this.parts = SideTask.done(Parts.of(templateDir, environment, !wholeStyleSheets));
    }

    private DossierRenderer(SideTask<Parts> parts) {
        this.figuresInline = false;
        this.parts = parts;
    }

    /**
     * A renderer that sets itself up, and renders a throw-away dossier, on a second thread while the
     * caller goes on (reading the workbook, computing): a command's first dossier then starts on
     * warm code. The first render waits for that and throws what setting up threw (a lab template
     * that fails to load, say); a template folder that does not exist is refused here, at once.
     */
    public static DossierRenderer warmingUp(Optional<Path> templateDir) {
        templateDir.ifPresent(TemplateEngine::requireFolder); // a mistyped folder is told before the study runs
        SvgChartRenderer warmUpCharts = new SvgChartRenderer();
        return new DossierRenderer(SideTask.start("meritbook-warm-up", () -> {
            Parts p = Parts.of(templateDir, RenderEnvironment.current());
            RenderingWarmUp.run(p.pdf(), new PdfAFinisher(), warmUpCharts);
            return p;
        }));
    }

    private Parts parts() {
        return parts.join("setting up the dossier renderer");
    }

    /**
     * @param results     the study's results
     * @param resultsJson the results.json bytes written for this run (attached to the PDF)
     */
    public RenderedDossier render(StudyResults results, byte[] resultsJson) {
        return render(results, resultsJson, RevisionContext.none());
    }

    /**
     * @param revisions the earlier revisions' history and the changes since the latest one
     */
    public RenderedDossier render(StudyResults results, byte[] resultsJson, RevisionContext revisions) {
        Prepared p = prepare(results, resultsJson, revisions);
        Parts parts = parts();
        // The figures are drawn on a worker while this thread lays out the pages around placeholders.
        p.figureArt().startDrawing();
        DossierView laidOut = figuresInline ? p.view().withFigureMarkup(p.figureArt().resolver()) : p.view();
        String xhtml = parts.templates().render(laidOut);
        FrontMatter fm = results.study().frontMatter();
        String subject = "Validation dossier, method " + p.view().cover().method() + ", revision " + fm.revision();
        PdfAFinisher.Metadata meta = new PdfAFinisher.Metadata(fm.title(), p.view().cover().preparedBy(), subject,
                "meritbook " + meritbookVersion, p.date().calendar(), p.id());
        byte[] pdfBytes = finisher.finish(parts.pdf().render(xhtml, p.figureArt()), meta, p.files());
        return new RenderedDossier(html(p), pdfBytes);
    }

    /**
     * The HTML dossier alone, the same bytes {@link #render} gives as its HTML; for the live
     * preview, which skips the PDF (about a second of work) on every change.
     */
    public byte[] renderHtml(StudyResults results, byte[] resultsJson) {
        return renderHtml(results, resultsJson, RevisionContext.none());
    }

    /** The HTML dossier alone, with the earlier revisions' history and the changes since the latest. */
    public byte[] renderHtml(StudyResults results, byte[] resultsJson, RevisionContext revisions) {
        return html(prepare(results, resultsJson, revisions));
    }

    private byte[] html(Prepared p) {
        DossierView drawn = p.view().withFigureMarkup(p.figureArt().resolver());
        return parts().templates().render(drawn.forPdf(false)).getBytes(StandardCharsets.UTF_8);
    }

    /** What both renderings need: the attached files' bytes, the document id and date, the view-model. */
    private record Prepared(DossierView view, FigureArt figureArt, List<PdfAFinisher.Embedded> files, byte[] id,
                            DocumentDate date) {
    }

    private Prepared prepare(StudyResults results, byte[] resultsJson, RevisionContext revisions) {
        List<Attachment> plan = AttachmentPlan.of(results);
        List<PdfAFinisher.Embedded> files = new ArrayList<>();
        for (Attachment a : plan) {
            byte[] bytes = a.content() != null ? a.content() : a.source() == null ? resultsJson.clone() : read(a, results);
            files.add(new PdfAFinisher.Embedded(a, bytes));
        }
        byte[] id = documentId(files);
        String idHex = HexFormat.of().formatHex(id);
        DocumentDate date = DocumentDate.of(results.study().frontMatter(), results.inputs());
        FigureArt art = new FigureArt(figures::drawing);
        DossierView view = parts().model().build(results, files, date, idHex, revisions, art);
        return new Prepared(view, art, files, id, date);
    }

    /** Reads an input to attach, checking it is still the file the run read (same SHA-256). */
    private static byte[] read(Attachment a, StudyResults results) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(a.source());
        } catch (NoSuchFileException e) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, a.source().toString(), "the input to attach",
                    "no such file", "Restore the file, or re-run the study.");
        } catch (IOException e) {
            throw new InputException(ErrorKey.CORRUPT_FILE, a.source().toString(), "a readable input file",
                    e.getClass().getSimpleName() + ": " + e.getMessage(), "Check the file's permissions.");
        }
        Optional<InputFile> listed = results.inputs().stream().filter(f -> f.alias().equals(a.alias())).findFirst();
        if (listed.isPresent() && !listed.get().sha256().equalsIgnoreCase(sha256Hex(bytes))) {
            throw new InputException(ErrorKey.CORRUPT_FILE, a.source().toString(),
                    "the file as read by this run (SHA-256 " + listed.get().sha256() + ")",
                    "different content (SHA-256 " + sha256Hex(bytes) + ")",
                    "The file changed while the study ran; run the study again.");
        }
        return bytes;
    }

    /** 16 bytes of SHA-256 over every attached file's name and bytes, in attachment order. */
    static byte[] documentId(List<PdfAFinisher.Embedded> files) {
        MessageDigest md = sha256();
        for (PdfAFinisher.Embedded e : files) {
            byte[] name = e.attachment().name().getBytes(StandardCharsets.UTF_8);
            md.update(lengthPrefix(name.length));
            md.update(name);
            md.update(lengthPrefix(e.bytes().length));
            md.update(e.bytes());
        }
        return Arrays.copyOf(md.digest(), 16);
    }

    private static byte[] lengthPrefix(int n) {
        return new byte[] {(byte) (n >>> 24), (byte) (n >>> 16), (byte) (n >>> 8), (byte) n};
    }

    static String sha256Hex(byte[] bytes) {
        return HexFormat.of().formatHex(sha256().digest(bytes));
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }

    /** The libraries that shape the dossier's output, with the versions actually on the classpath. */
    private static List<SoftwareRow> renderingLibraries() {
        return List.of(
                new SoftwareRow("openhtmltopdf", mavenVersion("io.github.openhtmltopdf", "openhtmltopdf-pdfbox")),
                new SoftwareRow("Apache PDFBox", org.apache.pdfbox.util.Version.getVersion()),
                new SoftwareRow("Apache FreeMarker", freemarker.template.Configuration.getVersion().toString()),
                new SoftwareRow("XChart", mavenVersion("org.knowm.xchart", "xchart")),
                new SoftwareRow("commonmark-java", mavenVersion("org.commonmark", "commonmark")),
                new SoftwareRow("DejaVu fonts (jasperreports-fonts)",
                        mavenVersion("net.sf.jasperreports", "jasperreports-fonts")));
    }

    private static String mavenVersion(String group, String artifact) {
        String path = "/META-INF/maven/" + group + "/" + artifact + "/pom.properties";
        try (InputStream in = DossierRenderer.class.getResourceAsStream(path)) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }
}
