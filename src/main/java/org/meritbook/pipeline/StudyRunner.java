package org.meritbook.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataAccess;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.accuracy.AccuracyAnalysis;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.analysis.detection.DetectionLimitAnalysis;
import org.meritbook.analysis.precision.PrecisionAnalysis;
import org.meritbook.analysis.range.RangeAnalysis;
import org.meritbook.analysis.unknowns.UnknownsAnalysis;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.criteria.ProfileBands;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Exclusion;
import org.meritbook.study.SourceFile;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.WorkbookBudget;
import org.meritbook.workbook.WorkbookReader;
import org.meritbook.workbook.WorkbookShelf;

/**
 * Runs a study notebook: parse, read the blocks each cell names, run the analyses in notebook
 * order, and checksum the inputs. A plain function of the notebook and the workbooks it names.
 */
public final class StudyRunner implements AutoCloseable {
    private final Map<AnalysisKind, Analysis> analyses;
    /** Parsed workbooks kept between runs (a live session); null: each run parses its files. */
    private final WorkbookShelf shelf;

    public StudyRunner(Map<AnalysisKind, Analysis> analyses) {
        this(analyses, null);
    }

    private StudyRunner(Map<AnalysisKind, Analysis> analyses, WorkbookShelf shelf) {
        this.analyses = new EnumMap<>(analyses);
        this.shelf = shelf;
    }

    /**
     * This runner, keeping the workbooks it parses for its next runs until it is closed: a file whose
     * bytes have not changed is not parsed again (the live notebook re-runs on every save).
     */
    public StudyRunner keepingWorkbooks() {
        return new StudyRunner(analyses, new WorkbookShelf());
    }

    /** Lets go of the workbooks a {@link #keepingWorkbooks} runner keeps; nothing for another runner. */
    @Override
    public void close() {
        if (shelf != null) {
            shelf.close();
        }
    }

    /** The analyses this version implements. */
    public static StudyRunner withBuiltInAnalyses() {
        // One line per kind: the order does not matter, cells run in notebook order.
        return new StudyRunner(Map.ofEntries(
                Map.entry(AnalysisKind.CALIBRATION, new CalibrationAnalysis()),
                Map.entry(AnalysisKind.ACCURACY, new AccuracyAnalysis()),
                Map.entry(AnalysisKind.DETECTION_LIMIT, new DetectionLimitAnalysis()),
                Map.entry(AnalysisKind.PRECISION, new PrecisionAnalysis()),
                Map.entry(AnalysisKind.RANGE, new RangeAnalysis()),
                Map.entry(AnalysisKind.UNKNOWNS, new UnknownsAnalysis())));
    }

    /** The kinds this runner runs. */
    public Set<AnalysisKind> kinds() {
        return Set.copyOf(analyses.keySet());
    }

    public StudyResults run(Path notebook) {
        return run(StudyParser.parse(notebook));
    }

    public StudyResults run(Study study) {
        checkKindsAvailable(study);
        checkSourceTypes(study);
        AcceptanceProfile profile = AcceptanceProfiles.of(study);
        checkExclusionRecords(study, profile);
        Map<String, Set<String>> rangesBySource = new LinkedHashMap<>();
        List<SectionResult> sections = new ArrayList<>();
        try (WorkbookReader reader = shelf == null ? new WorkbookReader()
                : new WorkbookReader(WorkbookBudget.fromEnvironment(), shelf)) {
            DataAccess access = reference -> {
                SourceFile source = study.sources().get(reference.source());
                DataBlock block = reader.read(source.path(), reference);
                rangesBySource.computeIfAbsent(source.alias(), k -> new LinkedHashSet<>())
                        .add(block.sheet() + "!" + block.range());
                return block;
            };
            AnalysisContext context = new AnalysisContext(study, access, ProfileBands.of(profile));
            for (AnalysisCell cell : study.cells()) {
                SectionResult section = analyses.get(cell.kind()).run(cell, context);
                context = context.with(section);
                sections.add(profile == null ? section : profile.judge(section));
            }
            List<String> warnings = new ArrayList<>(unusedSources(study, rangesBySource));
            warnings.addAll(unappliedRules(profile, sections));
            return new StudyResults(study, inputs(study, rangesBySource, reader), sections,
                    SoftwareInventory.components(), profile, warnings);
        }
    }

    /** Every exclusion says who and when when the lab's profile asks it to, before any work. */
    private static void checkExclusionRecords(Study study, AcceptanceProfile profile) {
        if (profile == null || profile.exclusionRecord().isEmpty()) {
            return;
        }
        List<org.meritbook.error.Problem> problems = new ArrayList<>();
        for (AnalysisCell cell : study.cells()) {
            for (Exclusion e : cell.exclusions()) {
                for (String key : profile.exclusionRecord()) {
                    String given = key.equals("by") ? e.by() : e.on();
                    if (given == null) {
                        problems.add(new org.meritbook.error.Problem(ErrorKey.MISSING_OPTION,
                                study.file().getFileName() + " line " + e.line(),
                                (key.equals("by") ? "who excluded " : "when ") + e.address()
                                        + (key.equals("by") ? "" : " was excluded") + " ('" + key + ":'), as profile "
                                        + profile.name() + " asks of every exclusion", "no '" + key + ":' in the entry",
                                "Add '" + key + ": " + (key.equals("by") ? "<name>" : "YYYY-MM-DD")
                                        + "' under the entry's reason."));
                    }
                }
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /** Fails before any work when a cell names a kind this version cannot run yet. */
    private void checkKindsAvailable(Study study) {
        List<String> available = analyses.keySet().stream().map(AnalysisKind::keyword).sorted().toList();
        List<org.meritbook.error.Problem> problems = new ArrayList<>();
        for (AnalysisCell cell : study.cells()) {
            if (!analyses.containsKey(cell.kind())) {
                problems.add(new org.meritbook.error.Problem(ErrorKey.UNKNOWN_KIND,
                        study.file().getFileName() + " line " + cell.line(),
                        "an analysis kind this version runs (" + String.join(", ", available) + ")",
                        "'" + cell.kind().keyword() + "', which is planned but not available yet",
                        "Keep the cell in a ```text block until a version that runs it."));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /**
     * A declared source must name a workbook file, whatever it holds: the run reads, checksums and
     * attaches only workbooks, never an arbitrary file that a sources: line happens to name.
     */
    private static void checkSourceTypes(Study study) {
        List<org.meritbook.error.Problem> problems = new ArrayList<>();
        for (SourceFile source : study.sources().values()) {
            if (!SourceTypes.isWorkbook(source.written())) {
                problems.add(new org.meritbook.error.Problem(ErrorKey.UNSUPPORTED_FORMAT,
                        study.file().getFileName() + " line " + source.line(),
                        "a workbook file (" + SourceTypes.DESCRIPTION + ") for source '" + source.alias() + "'",
                        "'" + source.written() + "'",
                        "Name the lab's workbook under sources:, or remove the line."));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /** A declared source that no cell reads is neither checksummed nor attached; the analyst is told. */
    private static List<String> unappliedRules(AcceptanceProfile profile, List<SectionResult> sections) {
        if (profile == null) {
            return List.of();
        }
        return profile.unapplied(sections).stream().map(r -> "Acceptance rule '" + r.text() + "' of profile "
                + profile.name() + " judged no section: the study has no cell it applies to.").toList();
    }

    private static List<String> unusedSources(Study study, Map<String, Set<String>> rangesBySource) {
        List<String> warnings = new ArrayList<>();
        for (SourceFile source : study.sources().values()) {
            if (!rangesBySource.containsKey(source.alias())) {
                warnings.add("Source '" + source.alias() + "' (" + source.written() + ", " + study.file().getFileName()
                        + " line " + source.line() + ") is declared but no cell reads it: it was not read, "
                        + "checksummed or attached. Remove it from sources: or use it in a cell.");
            }
        }
        return warnings;
    }

    private static List<InputFile> inputs(Study study, Map<String, Set<String>> rangesBySource,
                                          WorkbookReader reader) {
        List<InputFile> inputs = new ArrayList<>();
        inputs.add(file("notebook", study.file().getFileName().toString(), study.file(), List.of(), null));
        // A laboratory's own acceptance profile is an input like the workbooks: checksummed and attached.
        AcceptanceProfiles.file(study).ifPresent(profile ->
                inputs.add(file(AcceptanceProfiles.MANIFEST_ALIAS, study.frontMatter().criteria().strip(), profile, List.of(), null)));
        for (SourceFile source : study.sources().values()) {
            List<String> ranges = List.copyOf(rangesBySource.getOrDefault(source.alias(), Set.of()));
            if (ranges.isEmpty()) {
                continue; // declared but not used: a warning, never an input
            }
            if (!Files.isRegularFile(source.path())) {
                throw new InputException(ErrorKey.FILE_NOT_FOUND,
                        study.file().getFileName() + " line " + source.line(),
                        "the workbook '" + source.written() + "' declared as source '" + source.alias() + "'",
                        "no such file at " + source.path().toAbsolutePath().normalize(),
                        "Correct the path under sources: (it is relative to the notebook's folder).");
            }
            String savedOn = reader.recordedSaveTime(source.path())
                    .map(t -> LocalDate.ofInstant(t, ZoneOffset.UTC).toString()).orElse(null);
            inputs.add(file(source.alias(), source.written(), source.path(), ranges, savedOn));
        }
        return inputs;
    }

    private static InputFile file(String alias, String written, Path path, List<String> ranges, String savedOn) {
        try {
            return new InputFile(alias, written, Sha256.of(path), Files.size(path), ranges, savedOn);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
