package org.meritbook.analysis;

import java.util.Objects;

/**
 * The judgement of one characteristic against one acceptance rule.
 *
 * @param characteristic what is judged, e.g. "Linearity"
 * @param quantity       the results.json quantity name judged, e.g. {@code r_squared}; a family's name
 *                       ({@code qc_deviation_percent}) when one verdict judges its members together; null
 *                       when the verdict judges no one quantity
 * @param rule           the rule as text, e.g. "r² ≥ 0.995"
 * @param outcome        pass, fail or not evaluable
 * @param reason         why (the value compared, or why it could not be evaluated)
 */
public record Verdict(String characteristic, String quantity, String rule, Outcome outcome, String reason) {
    public Verdict {
        Objects.requireNonNull(characteristic, "characteristic");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(outcome, "outcome");
    }

    public enum Outcome {
        PASS, FAIL, NOT_EVALUABLE
    }
}
