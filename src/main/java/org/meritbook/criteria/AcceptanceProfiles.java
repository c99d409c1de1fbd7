package org.meritbook.criteria;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;

/** Resolves the notebook's {@code criteria:} to a profile: a built-in name, or a YAML file beside the notebook. */
public final class AcceptanceProfiles {
    private AcceptanceProfiles() {
    }

    /** The study's profile, or null when the notebook names none. */
    public static AcceptanceProfile of(Study study) {
        String written = study.frontMatter().criteria();
        if (written == null || written.isBlank()) {
            return null;
        }
        String name = written.strip();
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".yaml") || lower.endsWith(".yml")) {
            Path dir = study.file().toAbsolutePath().getParent();
            return ProfileFile.read(dir.resolve(name).normalize(), name);
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
