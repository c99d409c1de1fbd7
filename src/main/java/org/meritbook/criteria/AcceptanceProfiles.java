package org.meritbook.criteria;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;

/** Resolves the notebook's {@code criteria:} to a profile: a built-in name, or a YAML file beside the notebook. */
public final class AcceptanceProfiles {
    /** The alias under which a laboratory's profile file is listed in the input manifest. */
    public static final String MANIFEST_ALIAS = "criteria";

    private AcceptanceProfiles() {
    }

    /** The study's profile, or null when the notebook names none. */
    public static AcceptanceProfile of(Study study) {
        String written = study.frontMatter().criteria();
        if (written == null || written.isBlank()) {
            return null;
        }
        String name = written.strip();
        Optional<Path> file = file(study);
        if (file.isPresent()) {
            return ProfileFile.read(file.get(), name);
        }
        Map<String, AcceptanceProfile> builtIn = BuiltInProfiles.all();
        AcceptanceProfile p = builtIn.get(name);
        if (p == null) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, study.file().getFileName() + " line " + line(study),
                    "a built-in acceptance profile (" + String.join(", ", builtIn.keySet()) + ") or a .yaml profile file",
                    "'" + name + "'", "Name a built-in profile, or write the lab's own profile file (docs/criteria.md).");
        }
        return p;
    }

    /**
     * The laboratory's profile file the notebook names (an input of the run, attached to the
     * dossier like the workbooks), or empty for a built-in profile or none.
     */
    public static Optional<Path> file(Study study) {
        String written = study.frontMatter().criteria();
        if (written == null) {
            return Optional.empty();
        }
        String name = written.strip();
        String lower = name.toLowerCase(Locale.ROOT);
        if (!lower.endsWith(".yaml") && !lower.endsWith(".yml")) {
            return Optional.empty();
        }
        return Optional.of(study.file().toAbsolutePath().getParent().resolve(name).normalize());
    }

    /** The front-matter line of {@code criteria:} (FrontMatter keeps values, not their lines). */
    private static int line(Study study) {
        String[] lines = study.text().split("\n", -1);
        for (int i = 1; i < lines.length && !lines[i].strip().equals("---"); i++) {
            if (lines[i].startsWith("criteria:")) {
                return i + 1;
            }
        }
        return 1;
    }
}
