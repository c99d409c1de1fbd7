package org.meritbook.dossier;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.MultiTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.TemplateClassResolver;
import freemarker.core.XHTMLOutputFormat;
import freemarker.template.Configuration;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TimeZone;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * Freemarker, configured to lay out and nothing else: XHTML output with auto-escaping (text from
 * workbooks and notebooks cannot inject markup), strict about missing values (no defaults, errors
 * rethrown), no number or date formatting of its own, no {@code ?new} or {@code ?api}. A lab's
 * template folder is searched first; any file it lacks comes from the defaults in the jar.
 */
final class TemplateEngine {
    static final String MAIN = "dossier.ftlh";
    static final String CLASSPATH_PREFIX = "/report-templates";

    private final Configuration cfg;

    TemplateEngine(Optional<Path> templateDir) {
        cfg = new Configuration(Configuration.VERSION_2_3_34);
        List<TemplateLoader> loaders = new ArrayList<>();
        templateDir.ifPresent(dir -> {
            requireFolder(dir);
            try {
                loaders.add(new FileTemplateLoader(dir.toFile()));
            } catch (IOException e) {
                throw new UncheckedIOException("template folder " + dir + " is unreadable", e);
            }
        });
        loaders.add(new ClassTemplateLoader(TemplateEngine.class, CLASSPATH_PREFIX));
        cfg.setTemplateLoader(new MultiTemplateLoader(loaders.toArray(TemplateLoader[]::new)));
        cfg.setDefaultEncoding("UTF-8");
        cfg.setRecognizeStandardFileExtensions(false);
        cfg.setOutputFormat(XHTMLOutputFormat.INSTANCE);
        cfg.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        cfg.setLogTemplateExceptions(false);
        cfg.setWrapUncheckedExceptions(true);
        cfg.setFallbackOnNullLoopVariable(false);
        cfg.setAPIBuiltinEnabled(false);
        cfg.setNewBuiltinClassResolver(TemplateClassResolver.ALLOWS_NOTHING_RESOLVER);
        cfg.setLocale(Locale.ROOT);
        cfg.setTimeZone(TimeZone.getTimeZone("UTC"));
        cfg.setNumberFormat("computer");
        cfg.setBooleanFormat("c");
    }

    /** A lab's template folder must be a folder: a mistyped path is the user's to fix, not an internal error. */
    static void requireFolder(Path dir) {
        if (Files.isDirectory(dir)) {
            return;
        }
        throw new InputException(ErrorKey.FILE_NOT_FOUND, dir.toString(), "a folder of dossier templates (--templates)",
                Files.exists(dir) ? "a file, not a folder" : "no such folder",
                "Give the folder that holds the lab's copy of report-templates/, or leave --templates out.");
    }

    String render(DossierView view) {
        StringWriter out = new StringWriter(1 << 16);
        try {
            cfg.getTemplate(MAIN).process(view, out);
        } catch (IOException e) {
            throw new UncheckedIOException("dossier template " + MAIN + " could not be read", e);
        } catch (TemplateException e) {
            throw new IllegalStateException("dossier template failed: " + e.getMessageWithoutStackTop(), e);
        }
        return out.toString();
    }
}
