package org.meritbook.analysis;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;
import org.meritbook.study.Study;

/**
 * What an analysis may use besides its own cell: the study, the data, and the results of the cells
 * above it (cells run in notebook order, so a cell sees only what came earlier).
 *
 * @param study   the whole study (for messages: the notebook's file name)
 * @param data    data access
 * @param earlier the sections of the cells run so far, by cell id
 * @param bands   the limits the study's acceptance profile sets, for figures that draw them
 */
public record AnalysisContext(Study study, DataAccess data, Map<String, SectionResult> earlier, AcceptanceBands bands) {
    public AnalysisContext {
        Objects.requireNonNull(study, "study");
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(bands, "bands");
        earlier = Collections.unmodifiableMap(new LinkedHashMap<>(earlier));
    }

    /** A study judged by no profile. */
    public AnalysisContext(Study study, DataAccess data) {
        this(study, data, Map.of(), AcceptanceBands.NONE);
    }

    public AnalysisContext(Study study, DataAccess data, AcceptanceBands bands) {
        this(study, data, Map.of(), bands);
    }

    /** This context with one more section run. */
    public AnalysisContext with(SectionResult section) {
        Map<String, SectionResult> more = new LinkedHashMap<>(earlier);
        more.put(section.id(), section);
        return new AnalysisContext(study, data, more, bands);
    }

    /** {@code "study.md line 14"}, the form every notebook-located message uses. */
    public String where(int line) {
        return study.file().getFileName() + " line " + line;
    }

    /** The section of the earlier cell the option names ({@code calibration: cal-main}). */
    public SectionResult earlierSection(AnalysisCell cell, String option) {
        OptionValue ref = cell.option(option).orElseThrow(() -> new InputException(ErrorKey.MISSING_OPTION,
                where(cell.line()), "'" + option + ": <cell id>' naming an earlier cell", "no " + option + ": option",
                "Add '" + option + ": <id>' with the id of the cell whose result this cell uses."));
        SectionResult section = earlier.get(ref.text());
        if (section == null) {
            throw new InputException(ErrorKey.UNKNOWN_REFERENCE, where(ref.line()),
                    "the id of a cell above this one (" + (earlier.isEmpty() ? "none runs before it"
                            : String.join(", ", earlier.keySet())) + ")",
                    "'" + ref.text() + "'", "Name a cell that comes earlier in the notebook.");
        }
        return section;
    }

    /**
     * The typed result of the earlier cell the option names, e.g. a calibration's line.
     *
     * @param what how the needed result reads in a message, e.g. "a straight-line calibration"
     */
    public <T extends Exported> T earlier(AnalysisCell cell, String option, Class<T> type, String what) {
        SectionResult section = earlierSection(cell, option);
        return section.export(type).orElseThrow(() -> new InputException(ErrorKey.UNKNOWN_REFERENCE,
                where(cell.lineOf(option)), what + " for '" + option + ": " + section.id() + "'",
                "cell '" + section.id() + "' (" + section.kind().keyword() + ") gives none",
                "Name a cell that gives " + what + "."));
    }
}
