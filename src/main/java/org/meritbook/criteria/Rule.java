package org.meritbook.criteria;

import java.util.List;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;

/** One acceptance rule of a profile: it judges the sections it applies to. */
public sealed interface Rule permits QuantityRule, DeviationRule, LevelRule, BoundRule, QcRunRule {
    /** The rule as the dossier states it, e.g. "r² ≥ 0.995". */
    String text();

    /** Where the limit comes from (a guideline, an SOP, or "common practice"), as the profile states it. */
    String source();

    /** The verdicts on one section, values compared as computed. */
    default List<Verdict> judge(SectionResult section) {
        return judge(section, Comparison.AS_COMPUTED);
    }

    /**
     * The verdicts on one section (one per judged family member), empty when the rule does not apply;
     * values are compared with the limit as the profile states.
     */
    List<Verdict> judge(SectionResult section, Comparison comparison);
}
