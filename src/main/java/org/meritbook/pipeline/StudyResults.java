package org.meritbook.pipeline;

import java.util.List;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.analysis.Verdict;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Study;

/**
 * The outcome of running a study: the parsed notebook, its inputs with checksums, and one section
 * result per analysis cell in notebook order. Renderers work from this alone.
 *
 * @param study    the parsed notebook
 * @param inputs   the notebook, the lab's profile file and every workbook read (only those), with SHA-256
 *                 and ranges used
 * @param sections section results in notebook order
 * @param software   name and version of meritbook and its main libraries, for the dossier
 * @param acceptance the acceptance profile the sections were judged by, or null when none was named
 * @param warnings   warnings about the study as a whole (a declared source that no cell reads), in
 *                   notebook order; the dossier, results.json and the command line show them
 */
public record StudyResults(Study study, List<InputFile> inputs, List<SectionResult> sections,
                           List<SoftwareComponent> software, AcceptanceProfile acceptance, List<String> warnings) {
    public StudyResults {
        inputs = List.copyOf(inputs);
        sections = List.copyOf(sections);
        software = List.copyOf(software);
        warnings = List.copyOf(warnings);
    }

    /** Results without study-level warnings. */
    public StudyResults(Study study, List<InputFile> inputs, List<SectionResult> sections,
                        List<SoftwareComponent> software, AcceptanceProfile acceptance) {
        this(study, inputs, sections, software, acceptance, List.of());
    }

    /** The same results recording other software (verify re-renders with the versions the dossier states). */
    public StudyResults withSoftware(List<SoftwareComponent> recorded) {
        return new StudyResults(study, inputs, sections, recorded, acceptance, warnings);
    }

    /** Results judged by no acceptance profile. */
    public StudyResults(Study study, List<InputFile> inputs, List<SectionResult> sections,
                        List<SoftwareComponent> software) {
        this(study, inputs, sections, software, null);
    }

    /**
     * True when the section's cell is marked {@code role: supporting}: shown and judged, but kept out
     * of the study's outcome and its counts.
     */
    public boolean supporting(SectionResult section) {
        return study.cell(section.id()).map(AnalysisCell::supporting).orElse(false);
    }

    /** The verdicts that decide the study's outcome: those of the reporting (not supporting) sections. */
    public List<Verdict> reportingVerdicts() {
        return sections.stream().filter(s -> !supporting(s)).flatMap(s -> s.verdicts().stream()).toList();
    }

    /** A component and its version, e.g. ("Apache POI", "5.4.1"). */
    public record SoftwareComponent(String name, String version) {
    }
}
