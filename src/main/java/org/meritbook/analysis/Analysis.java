package org.meritbook.analysis;

import org.meritbook.study.AnalysisCell;

/**
 * One analysis kind: turns a notebook cell and its data into a section result. Implementations
 * are stateless; bad input is an {@link org.meritbook.error.InputException} naming the notebook
 * line or the cell.
 */
public interface Analysis {
    SectionResult run(AnalysisCell cell, AnalysisContext context);
}
