package org.meritbook.revision;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/** Reads the files a dossier PDF carries (its PDF/A-3 associated files), by attachment name. */
final class DossierAttachments {
    private DossierAttachments() {
    }

    /** Attachment name → bytes, in the PDF's (sorted) name-tree order. */
    static Map<String, byte[]> read(Path pdf) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            PDDocumentNameDictionary names = doc.getDocumentCatalog().getNames();
            PDEmbeddedFilesNameTreeNode tree = names == null ? null : names.getEmbeddedFiles();
            Map<String, PDComplexFileSpecification> specs = tree == null ? null : tree.getNames();
            if (specs != null) {
                for (Map.Entry<String, PDComplexFileSpecification> e : specs.entrySet()) {
                    PDEmbeddedFile file = e.getValue().getEmbeddedFile();
                    if (file != null) {
                        files.put(e.getKey(), file.toByteArray());
                    }
                }
            }
        } catch (IOException e) {
            throw new InputException(ErrorKey.CORRUPT_FILE, pdf.getFileName().toString(), "a PDF dossier",
                    "a file PDFBox cannot read (" + e.getMessage() + ")", "Check that the file is the dossier PDF.");
        }
        return files;
    }
}
