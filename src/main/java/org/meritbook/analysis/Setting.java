package org.meritbook.analysis;

import java.util.Objects;

/**
 * A statistical choice in force for a section, stated in the dossier: "Weighting" = "1/x".
 *
 * @param label the dossier's label
 * @param value the dossier's wording
 * @param key   the notebook's word for the choice ({@code linear}, {@code 1/x^2}), which rules match
 *              on, or null when the setting is not a notebook choice
 */
public record Setting(String label, String value, String key) {
    public Setting {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(value, "value");
    }

    public Setting(String label, String value) {
        this(label, value, null);
    }
}
