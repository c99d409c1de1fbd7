package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisKind;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * The nominal (known) concentration behind a per-level or per-sample quantity, read from the
 * section's own trail, so that a rule can set the lowest level (the LLOQ) apart without parsing
 * display text. Calibration: the standard's x; unknowns: the QC's known value; accuracy: the mean of
 * the known values (k, or the amount added) of the level's rows, found through the level's mean
 * recovery. Precision records no nominal value: a level whose label is a number is that number,
 * otherwise the level's mean ({@code mean:<level>}) stands for it.
 */
final class NominalLevels {
    /** The trail input names that hold a known value, by kind. */
    private static final Map<AnalysisKind, Set<String>> KNOWN = Map.of(
            AnalysisKind.CALIBRATION, Set.of("x"),
            AnalysisKind.UNKNOWNS, Set.of("known"),
            AnalysisKind.ACCURACY, Set.of("k", "added"));
    /** Far enough to reach an accuracy row's known value from a level's mean error (three steps). */
    private static final int MAX_DEPTH = 4;

    private NominalLevels() {
    }

    /** The member's nominal level, or empty when the section's trail does not give one. */
    static OptionalDouble of(SectionResult section, Quantity member) {
        Set<String> names = KNOWN.get(section.kind());
        if (names != null) {
            OptionalDouble fromTrail = fromTrail(section, member.stepId(), names);
            if (fromTrail.isPresent()) {
                return fromTrail;
            }
        }
        String label = member.name().contains(":") ? member.name().substring(member.name().indexOf(':') + 1) : null;
        if (label == null) {
            return OptionalDouble.empty();
        }
        try {
            double v = Double.parseDouble(label.strip());
            if (Double.isFinite(v)) {
                return OptionalDouble.of(v);
            }
        } catch (NumberFormatException e) {
            // a text label ("QC-L"): the level's mean below, when the kind reports one
        }
        if (section.kind() == AnalysisKind.PRECISION) {
            return section.quantity("mean:" + label).map(q -> OptionalDouble.of(q.value())).orElse(OptionalDouble.empty());
        }
        return OptionalDouble.empty();
    }

    /**
     * The mean of the known-value inputs at the first depth of the trail (breadth first from the
     * member's step, through inputs whose source is a step of this section) where any appears.
     */
    private static OptionalDouble fromTrail(SectionResult section, String stepId, Set<String> names) {
        Map<String, Step> steps = section.steps().stream()
                .collect(Collectors.toMap(Step::id, Function.identity(), (a, b) -> a));
        List<String> frontier = List.of(stepId);
        Set<String> seen = new HashSet<>(frontier);
        for (int depth = 0; depth < MAX_DEPTH && !frontier.isEmpty(); depth++) {
            List<Double> known = new ArrayList<>();
            List<String> next = new ArrayList<>();
            for (String id : frontier) {
                Step step = steps.get(id);
                if (step == null) {
                    continue;
                }
                for (StepInput in : step.inputs()) {
                    if (names.contains(in.name()) && Double.isFinite(in.value())) {
                        known.add(in.value());
                    } else if (steps.containsKey(in.source()) && seen.add(in.source())) {
                        next.add(in.source());
                    }
                }
            }
            if (!known.isEmpty()) {
                return OptionalDouble.of(known.stream().mapToDouble(Double::doubleValue).average().orElseThrow());
            }
            frontier = next;
        }
        return OptionalDouble.empty();
    }
}
