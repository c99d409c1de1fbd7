package org.meritbook.serve;

import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.pipeline.StudyResults;

/**
 * The acceptance outcome of one successful run, counted as the status bar shows it.
 *
 * Like the dossier's summary and the exit code, only the reporting cells' verdicts count; a
 * {@code role: supporting} check is shown and judged on the page but kept out of the counts.
 *
 * @param passed       verdicts that passed
 * @param failed       verdicts that failed
 * @param notEvaluable verdicts that could not be evaluated
 * @param warnings     section warnings plus warnings about the study as a whole
 */
public record Outcome(int passed, int failed, int notEvaluable, int warnings) {
    public Outcome {
        if (passed < 0 || failed < 0 || notEvaluable < 0 || warnings < 0) {
            throw new IllegalArgumentException("negative count");
        }
    }

    /** The colour class of the bar, one word. */
    public enum Level {
        /** at least one criterion failed */
        FAIL,
        /** nothing failed, but a criterion could not be evaluated or a warning stands */
        ATTENTION,
        /** nothing failed, nothing unevaluated, no warning */
        CLEAR;

        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    static Outcome of(StudyResults results) {
        int passed = 0;
        int failed = 0;
        int notEvaluable = 0;
        int warnings = results.warnings().size();
        for (Verdict v : results.reportingVerdicts()) {
            if (v.outcome() == Verdict.Outcome.PASS) {
                passed++;
            } else if (v.outcome() == Verdict.Outcome.FAIL) {
                failed++;
            } else {
                notEvaluable++;
            }
        }
        for (SectionResult section : results.sections()) {
            warnings += section.warnings().size();
        }
        return new Outcome(passed, failed, notEvaluable, warnings);
    }

    public Level level() {
        if (failed > 0) {
            return Level.FAIL;
        }
        return notEvaluable > 0 || warnings > 0 ? Level.ATTENTION : Level.CLEAR;
    }
}
