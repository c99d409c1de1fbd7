package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.analysis.SectionResult;

/**
 * A named set of acceptance rules. Built-in profiles are defaults to be confirmed by the laboratory;
 * a lab's own profile is a YAML file.
 *
 * @param name        the name the notebook's {@code criteria:} gives
 * @param description what it is for, in a sentence
 * @param origin      "built in" or the profile file's path as written
 * @param rules       the rules, in the order the dossier lists them
 */
public record AcceptanceProfile(String name, String description, String origin, List<Rule> rules) {
    public AcceptanceProfile {
        Objects.requireNonNull(name, "name");
        rules = List.copyOf(rules);
    }

    /** The section with this profile's verdicts added, in rule order. */
    public SectionResult judge(SectionResult section) {
        List<Verdict> verdicts = new ArrayList<>(section.verdicts());
        for (Rule rule : rules) {
            verdicts.addAll(rule.judge(section));
        }
        return section.withVerdicts(verdicts);
    }
}
