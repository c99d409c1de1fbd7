package org.meritbook.analysis;

import java.util.List;
import java.util.Objects;

/**
 * The members of a section that stand at the LLOQ, and how they were identified, for the acceptance
 * rules that give the LLOQ a limit of its own (ICH M10's ±20 %). A section that exports none has no
 * LLOQ identified: those rules then apply their general limit to every member and say why.
 *
 * @param labels the member labels at the LLOQ (the part after {@code :} in {@code error_percent:<label>});
 *               empty when the section was searched and no member stands there
 * @param basis  how they were identified, as the section's settings and the verdicts say it
 */
public record LloqLevel(List<String> labels, String basis) implements Exported {
    public LloqLevel {
        labels = List.copyOf(labels);
        Objects.requireNonNull(basis, "basis");
    }

    /** Whether the member labelled {@code label} stands at the LLOQ. */
    public boolean contains(String label) {
        return labels.contains(label);
    }
}
