package org.meritbook.analysis;

import java.util.Objects;
import org.meritbook.study.Study;

/**
 * What an analysis may use besides its own cell.
 *
 * @param study the whole study (for messages: the notebook's file name)
 * @param data  data access
 */
public record AnalysisContext(Study study, DataAccess data) {
    public AnalysisContext {
        Objects.requireNonNull(study, "study");
        Objects.requireNonNull(data, "data");
    }

    /** {@code "study.md line 14"}, the form every notebook-located message uses. */
    public String where(int line) {
        return study.file().getFileName() + " line " + line;
    }
}
