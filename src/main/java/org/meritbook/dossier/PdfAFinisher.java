package org.meritbook.dossier;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Calendar;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import javax.xml.transform.TransformerException;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentCatalog;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.PageMode;
import org.apache.pdfbox.pdmodel.common.PDMetadata;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.apache.xmpbox.XMPMetadata;
import org.apache.xmpbox.schema.AdobePDFSchema;
import org.apache.xmpbox.schema.DublinCoreSchema;
import org.apache.xmpbox.schema.PDFAIdentificationSchema;
import org.apache.xmpbox.schema.XMPBasicSchema;
import org.apache.xmpbox.type.BadFieldValueException;
import org.apache.xmpbox.xml.XmpSerializer;

/**
 * Completes the rendered PDF as a reproducible PDF/A-3u archive: Info and XMP metadata that agree
 * and carry the notebook's date (never the clock), a document /ID from the inputs' hash, and the
 * inputs and results.json embedded as associated files (/AF with /AFRelationship).
 */
final class PdfAFinisher {
    static final String PRODUCER = "meritbook dossier renderer (openhtmltopdf, Apache PDFBox)";

    /** What the metadata says; {@code id} is 16 bytes derived from the inputs. */
    record Metadata(String title, String author, String subject, String creatorTool, Calendar date, byte[] id) {
    }

    /** An attachment with its bytes. */
    record Embedded(Attachment attachment, byte[] bytes) {
    }

    byte[] finish(PDDocument doc, Metadata meta, List<Embedded> files) {
        try (doc) {
            info(doc, meta);
            xmp(doc, meta);
            attach(doc, meta.date(), files);
            doc.getDocumentCatalog().setPageMode(PageMode.USE_OUTLINES);
            COSArray id = new COSArray();
            id.add(new COSString(meta.id()));
            id.add(new COSString(meta.id()));
            doc.getDocument().setDocumentID(id);
            ByteArrayOutputStream out = new ByteArrayOutputStream(1 << 20);
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("PDF could not be finished", e);
        }
    }

    private static void info(PDDocument doc, Metadata meta) {
        PDDocumentInformation info = new PDDocumentInformation();
        info.setTitle(meta.title());
        info.setAuthor(meta.author());
        info.setSubject(meta.subject());
        info.setCreator(meta.creatorTool());
        info.setProducer(PRODUCER);
        info.setCreationDate(meta.date());
        info.setModificationDate(meta.date());
        doc.setDocumentInformation(info);
    }

    private static void xmp(PDDocument doc, Metadata meta) throws IOException {
        XMPMetadata xmp = XMPMetadata.createXMPMetadata();
        try {
            DublinCoreSchema dc = xmp.createAndAddDublinCoreSchema();
            dc.setTitle(meta.title());
            dc.addCreator(meta.author());
            dc.addDescription(null, meta.subject());
            dc.setFormat("application/pdf");
            AdobePDFSchema pdf = xmp.createAndAddAdobePDFSchema();
            pdf.setProducer(PRODUCER);
            XMPBasicSchema basic = xmp.createAndAddXMPBasicSchema();
            basic.setCreatorTool(meta.creatorTool());
            basic.setCreateDate(meta.date());
            basic.setModifyDate(meta.date());
            basic.setMetadataDate(meta.date());
            PDFAIdentificationSchema id = xmp.createAndAddPDFAIdentificationSchema();
            id.setPart(3);
            id.setConformance("U");
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            new XmpSerializer().serialize(xmp, out, true);
            PDMetadata metadata = new PDMetadata(doc);
            metadata.importXMPMetadata(out.toByteArray());
            doc.getDocumentCatalog().setMetadata(metadata);
        } catch (BadFieldValueException | TransformerException e) {
            throw new IllegalStateException("XMP metadata could not be written", e);
        }
    }

    private static void attach(PDDocument doc, Calendar date, List<Embedded> files) throws IOException {
        Map<String, PDComplexFileSpecification> byName = new TreeMap<>(); // a name tree must be sorted
        COSArray af = new COSArray();
        for (Embedded e : files) {
            Attachment a = e.attachment();
            PDEmbeddedFile ef = new PDEmbeddedFile(doc, new ByteArrayInputStream(e.bytes()), COSName.FLATE_DECODE);
            ef.setSubtype(a.mimeType());
            ef.setSize(e.bytes().length);
            ef.setCreationDate(date);
            ef.setModDate(date);
            PDComplexFileSpecification spec = new PDComplexFileSpecification();
            spec.setFile(a.name());
            spec.setFileUnicode(a.name());
            spec.setFileDescription(a.description());
            spec.setEmbeddedFile(ef);
            spec.setEmbeddedFileUnicode(ef);
            spec.getCOSObject().setName(COSName.getPDFName("AFRelationship"), a.relationship());
            byName.put(a.name(), spec);
            af.add(spec);
        }
        PDEmbeddedFilesNameTreeNode tree = new PDEmbeddedFilesNameTreeNode();
        tree.setNames(byName);
        PDDocumentCatalog catalog = doc.getDocumentCatalog();
        PDDocumentNameDictionary names = catalog.getNames() == null
                ? new PDDocumentNameDictionary(catalog) : catalog.getNames();
        names.setEmbeddedFiles(tree);
        catalog.setNames(names);
        catalog.getCOSObject().setItem(COSName.getPDFName("AF"), af);
    }

}
