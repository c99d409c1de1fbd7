package org.meritbook.analysis;

/**
 * A typed result a section hands to later cells (a calibration's fitted line, say), beside the
 * named quantities it reports. Later cells ask for it by type through
 * {@link AnalysisContext#earlier(org.meritbook.study.AnalysisCell, String, Class, String)}; nothing crosses
 * between cells as display text.
 */
public interface Exported {
}
