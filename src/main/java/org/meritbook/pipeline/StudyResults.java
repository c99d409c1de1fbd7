package org.meritbook.pipeline;

import java.util.List;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.revision.InputFile;
import org.meritbook.study.Study;

/**
 * The outcome of running a study: the parsed notebook, its inputs with checksums, and one section
 * result per analysis cell in notebook order. Renderers work from this alone.
 *
 * @param study    the parsed notebook
 * @param inputs   the notebook and every workbook read, with SHA-256 and ranges used
 * @param sections section results in notebook order
 * @param software   name and version of meritbook and its main libraries, for the dossier
 * @param acceptance the acceptance profile the sections were judged by, or null when none was named
 */
public record StudyResults(Study study, List<InputFile> inputs, List<SectionResult> sections,
                           List<SoftwareComponent> software, AcceptanceProfile acceptance) {
    public StudyResults {
        inputs = List.copyOf(inputs);
        sections = List.copyOf(sections);
        software = List.copyOf(software);
    }

    /** Results judged by no acceptance profile. */
    public StudyResults(Study study, List<InputFile> inputs, List<SectionResult> sections,
                        List<SoftwareComponent> software) {
        this(study, inputs, sections, software, null);
    }

    /** A component and its version, e.g. ("Apache POI", "5.4.1"). */
    public record SoftwareComponent(String name, String version) {
    }
}
