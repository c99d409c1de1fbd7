package org.meritbook.study;

/** Narrative Markdown between analysis cells, kept verbatim for the dossier. */
public record Narrative(String markdown, int line) implements StudyElement {
}
