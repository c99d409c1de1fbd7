package org.meritbook.analysis;

/** A statistical choice in force for a section, stated in the dossier: "Weighting" = "1/x". */
public record Setting(String label, String value) {
}
