package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;

/**
 * A named set of acceptance rules. Built-in profiles are defaults to be confirmed by the laboratory;
 * a lab's own profile is a YAML file.
 *
 * @param name        the name the notebook's {@code criteria:} gives
 * @param description what it is for, in a sentence
 * @param origin      "built in" or the profile file's path as written
 * @param rules       the rules, in the order the dossier lists them
 * @param comparison  how values are compared with their limits (as computed, or rounded to the limit first)
 * @param exclusionRecord what every {@code exclude:} entry must say besides its reason: {@code by}
 *                    (who) and/or {@code on} (when), as the lab's procedure asks; empty for none
 */
public record AcceptanceProfile(String name, String description, String origin, List<Rule> rules,
                                Comparison comparison, List<String> exclusionRecord) {
    /** The entry keys a profile may ask every exclusion to carry. */
    public static final List<String> EXCLUSION_KEYS = List.of("by", "on");

    public AcceptanceProfile {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(comparison, "comparison");
        rules = List.copyOf(rules);
        exclusionRecord = List.copyOf(exclusionRecord);
        if (!EXCLUSION_KEYS.containsAll(exclusionRecord)) {
            throw new IllegalArgumentException("an exclusion record is made of " + EXCLUSION_KEYS + ": " + exclusionRecord);
        }
    }

    /** A profile that asks nothing of exclusions beyond their reason. */
    public AcceptanceProfile(String name, String description, String origin, List<Rule> rules, Comparison comparison) {
        this(name, description, origin, rules, comparison, List.of());
    }

    /** A profile that compares values as computed (the built-in profiles do). */
    public AcceptanceProfile(String name, String description, String origin, List<Rule> rules) {
        this(name, description, origin, rules, Comparison.AS_COMPUTED);
    }

    /**
     * The rules that judged none of these sections: a reviewer must see that a criterion of the
     * profile was not applied at all (no cell of its kind or model), not read its silence as a pass.
     */
    public List<Rule> unapplied(List<SectionResult> sections) {
        return rules.stream().filter(r -> sections.stream().allMatch(s -> r.judge(s, comparison).isEmpty())).toList();
    }

    /** The section with this profile's verdicts added, in rule order. */
    public SectionResult judge(SectionResult section) {
        List<Verdict> verdicts = new ArrayList<>(section.verdicts());
        for (Rule rule : rules) {
            verdicts.addAll(rule.judge(section, comparison));
        }
        return section.withVerdicts(verdicts);
    }
}
