package org.meritbook.dossier;

import com.openhtmltopdf.outputdevice.helper.ExternalResourceControlPriority;
import com.openhtmltopdf.pdfboxout.PdfBoxRenderer;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import com.openhtmltopdf.util.Diagnostic;
import com.openhtmltopdf.util.XRLog;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.logging.Level;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;

/**
 * XHTML to a PDF/A-3u page set with openhtmltopdf on PDFBox: embedded fonts only, sRGB output intent,
 * vector SVG, no external resource ever fetched. Returns the open document so that
 * {@link PdfAFinisher} can set metadata and attachments before it is saved once.
 */
final class PdfRenderer {
    /** Where relative links resolve; nothing is ever loaded from it (all access is denied). */
    private static final String BASE_URI = "file:/meritbook-dossier/";
    private static final System.Logger LOG = System.getLogger(PdfRenderer.class.getName());

    static {
        // openhtmltopdf narrates every run at INFO on stderr; only its warnings concern a user.
        for (String logger : XRLog.listRegisteredLoggers()) {
            XRLog.setLevel(logger, Level.WARNING);
        }
    }

    private final EmbeddedFonts fonts;
    private final GlyphCoverage coverage;
    private final byte[] srgb = ICC_Profile.getInstance(ColorSpace.CS_sRGB).getData();
    /** Style sheets cut to each page DOM ({@link UnusedStyleRules}); off only to test that the pages stay the same. */
    private final boolean pruneStyles;

    PdfRenderer(EmbeddedFonts fonts) {
        this(fonts, true);
    }

    PdfRenderer(EmbeddedFonts fonts, boolean pruneStyles) {
        this.fonts = fonts;
        this.coverage = new GlyphCoverage(fonts);
        this.pruneStyles = pruneStyles;
    }

    /** @param figureArt the figures whose placeholders the XHTML holds; put in after layout, before painting */
    PDDocument render(String xhtml, FigureArt figureArt) {
        Document dom = parse(xhtml);
        coverage.substitute(dom.getDocumentElement());
        PdfRendererBuilder b = new PdfRendererBuilder();
        b.useFastMode();
        b.usePdfAConformance(PdfRendererBuilder.PdfAConformance.PDFA_3_U);
        b.useColorProfile(srgb);
        b.useSVGDrawer(new BatikSVGDrawer(BatikSVGDrawer.SvgScriptMode.SECURE,
                BatikSVGDrawer.SvgExternalResourceMode.SECURE));
        b.useExternalResourceAccessControl((uri, type) -> false, ExternalResourceControlPriority.RUN_BEFORE_RESOLVING_URI);
        b.useExternalResourceAccessControl((uri, type) -> false, ExternalResourceControlPriority.RUN_AFTER_RESOLVING_URI);
        b.withProducer(PdfAFinisher.PRODUCER);
        b.withDiagnosticConsumer(PdfRenderer::report);
        fonts.register(b);
        if (pruneStyles) {
            b.useNamespaceHandler(new PrunedStyleHandler(dom));
        }
        b.withW3cDocument(dom, BASE_URI);
        try (PdfBoxRenderer renderer = b.buildPdfRenderer()) {
            renderer.layout();
            figureArt.fillIn(dom, coverage);
            return renderer.createPDFKeepOpen();
        } catch (IOException e) {
            throw new UncheckedIOException("PDF rendering failed", e);
        }
    }

    /** The renderer's progress notes are noise; its warnings (e.g. CSS in a lab template) are not. */
    private static void report(Diagnostic d) {
        if (d.getLevel().intValue() >= Level.WARNING.intValue()) {
            LOG.log(System.Logger.Level.WARNING, d.getFormattedMessage());
        }
    }

    static Document parse(String xhtml) {
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            f.setExpandEntityReferences(false);
            return f.newDocumentBuilder().parse(new InputSource(new StringReader(xhtml)));
        } catch (ParserConfigurationException | SAXException e) {
            throw new IllegalStateException("the dossier template produced malformed XHTML: " + e.getMessage(), e);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
