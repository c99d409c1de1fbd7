package org.meritbook.study;

/** A notebook element, in notebook order: narrative Markdown or an analysis cell. */
public sealed interface StudyElement permits Narrative, AnalysisCell {
    /** First notebook line of the element (1-based). */
    int line();
}
