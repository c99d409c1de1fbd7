package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meritbook.analysis.SectionResult;
import org.meritbook.dossier.DossierView.StepInputRow;
import org.meritbook.dossier.DossierView.StepView;
import org.meritbook.dossier.DossierView.TrailBlock;
import org.meritbook.dossier.DossierView.TrailGroup;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * The calculation-trail appendix: every step of every section, numbered A.&lt;section&gt;.&lt;step&gt;,
 * with links from a result to its step and from an input to the step it came from.
 */
final class TrailViewBuilder {
    /** Number and anchor of one step, for links from results and inputs. */
    record StepRef(String number, String anchor) {
    }

    /**
     * A section with more steps than this of one form (formula, method and input names: one per run of
     * a 1,000-run precision study, say) prints the first and last {@link #SHOWN_SIMILAR_STEPS} of them
     * and one line for the rest; trail.md and results.json hold every step.
     */
    static final int MAX_SIMILAR_STEPS = 100;
    static final int SHOWN_SIMILAR_STEPS = 5;
    /** A step with more inputs than this prints the first and last {@link #SHOWN_INPUTS} and one line for the rest. */
    static final int MAX_INPUTS = 100;
    static final int SHOWN_INPUTS = 20;

    private final DisplayFormatter format;
    private final Map<String, StepRef> refs = new HashMap<>();
    private final List<SectionResult> sections;
    private final String letter;
    /** Per section, the indexes of steps not printed, by their form. */
    private final List<Map<String, List<Integer>>> omitted = new ArrayList<>();

    TrailViewBuilder(List<SectionResult> sections, String letter, DisplayFormatter format) {
        this.sections = sections;
        this.letter = letter;
        this.format = format;
        int anchor = 0;
        for (int s = 0; s < sections.size(); s++) {
            List<Step> steps = sections.get(s).steps();
            Map<String, List<Integer>> left = omittedSteps(steps);
            omitted.add(left);
            Map<Integer, String> leftAnchor = new HashMap<>();
            int run = 0;
            for (List<Integer> indexes : left.values()) {
                String a = "trail-" + (s + 1) + "-omitted-" + (++run);
                indexes.forEach(i -> leftAnchor.put(i, a));
            }
            for (int i = 0; i < steps.size(); i++) {
                String id = steps.get(i).id();
                String a = "step-" + (++anchor);
                if (refs.putIfAbsent(id, new StepRef(letter + "." + (s + 1) + "." + (i + 1), leftAnchor.getOrDefault(i, a)))
                        != null) {
                    throw new IllegalArgumentException("trail step id " + id + " is not unique");
                }
            }
        }
    }

    /** The steps of each form beyond the first and last {@link #SHOWN_SIMILAR_STEPS}, for forms of more than the maximum. */
    private static Map<String, List<Integer>> omittedSteps(List<Step> steps) {
        Map<String, List<Integer>> byForm = new LinkedHashMap<>();
        for (int i = 0; i < steps.size(); i++) {
            byForm.computeIfAbsent(form(steps.get(i)), k -> new ArrayList<>()).add(i);
        }
        Map<String, List<Integer>> out = new LinkedHashMap<>();
        byForm.forEach((form, indexes) -> {
            if (indexes.size() > MAX_SIMILAR_STEPS) {
                out.put(form, List.copyOf(indexes.subList(SHOWN_SIMILAR_STEPS, indexes.size() - SHOWN_SIMILAR_STEPS)));
            }
        });
        return out;
    }

    /** The step's form as {@link TrailLayout} groups steps: formula, method and input names. */
    private static String form(Step step) {
        StringBuilder b = new StringBuilder(step.formula()).append('\u0000').append(step.method() == null ? "" : step.method());
        for (StepInput in : step.inputs()) {
            b.append('\u0000').append(in.name());
        }
        return b.toString();
    }

    /** The step's reference, or a blank one when the id names no step. */
    StepRef ref(String stepId) {
        return refs.getOrDefault(stepId, new StepRef("", ""));
    }

    List<TrailGroup> groups() {
        List<TrailGroup> out = new ArrayList<>();
        for (int s = 0; s < sections.size(); s++) {
            SectionResult section = sections.get(s);
            Set<Integer> left = new HashSet<>();
            omitted.get(s).values().forEach(left::addAll);
            List<StepView> steps = new ArrayList<>();
            for (int i = 0; i < section.steps().size(); i++) {
                if (!left.contains(i)) {
                    steps.add(view(section.steps().get(i)));
                }
            }
            List<TrailBlock> blocks = left.isEmpty() ? TrailLayout.blocks(steps) : withOmissions(section, s, steps);
            out.add(new TrailGroup(letter + "." + (s + 1), section.title() == null ? section.id() : section.title(),
                    "trail-" + (s + 1), steps, blocks));
        }
        return out;
    }

    /**
     * The printed steps' blocks, each form's omission line placed after the block holding the last
     * printed step before its first omitted one.
     */
    private List<TrailBlock> withOmissions(SectionResult section, int s, List<StepView> printed) {
        List<TrailBlock> blocks = new ArrayList<>(TrailLayout.blocks(printed));
        for (List<Integer> indexes : omitted.get(s).values()) {
            Step first = section.steps().get(indexes.get(0));
            Step last = section.steps().get(indexes.get(indexes.size() - 1));
            StepRef a = refs.get(first.id());
            StepRef b = refs.get(last.id());
            String text = String.format(Locale.ROOT, "%s to %s: %,d more steps of this form (%s … %s) not printed; "
                    + "trail.md and the attached results.json hold every one", a.number(), b.number(), indexes.size(),
                    first.label(), last.label());
            StepView stand = new StepView(a.number(), a.anchor(), first.id(), first.label(), first.formula(),
                    first.method() == null ? "" : first.method(), "", List.of(),
                    new DossierView.IndexedInputs(false, List.of(), List.of()), List.of());
            TrailBlock omission = new TrailBlock(false, stand, first.label(), first.formula(), stand.method(), List.of(), List.of(),
                    false, List.of(), text);
            String before = indexes.get(0) == 0 ? null : refs.get(section.steps().get(indexes.get(0) - 1).id()).anchor();
            int at = 0;
            for (int k = 0; k < blocks.size(); k++) {
                if (before != null && holds(blocks.get(k), before)) {
                    at = k + 1;
                }
            }
            blocks.add(at, omission);
        }
        return blocks;
    }

    private static boolean holds(TrailBlock block, String anchor) {
        if (block.compact()) {
            return block.rows().stream().anyMatch(r -> r.anchor().equals(anchor));
        }
        return block.step().anchor().equals(anchor);
    }

    private StepView view(Step step) {
        StepRef ref = refs.get(step.id());
        List<StepInputRow> inputs = new ArrayList<>();
        int n = step.inputs().size();
        for (int k = 0; k < n; k++) {
            if (n > MAX_INPUTS && k >= SHOWN_INPUTS && k < n - SHOWN_INPUTS) {
                if (k == SHOWN_INPUTS) {
                    inputs.add(new StepInputRow("…", String.format(Locale.ROOT, "%,d more inputs not printed", n - 2 * SHOWN_INPUTS),
                            "trail.md and the attached results.json hold every input", "",
                            "trail.md and the attached results.json hold every input"));
                }
                continue;
            }
            StepInput in = step.inputs().get(k);
            String value = in.text() != null ? in.text() : format.trailValue(in.value(), in.unit());
            StepRef source = ref(in.source());
            inputs.add(new StepInputRow(in.name(), value, in.source(), source.anchor(),
                    source.number().isEmpty() ? in.source() : source.number()));
        }
        TrailLayout.Indexed indexed = TrailLayout.indexed(inputs);
        return new StepView(ref.number(), ref.anchor(), step.id(), step.label(), step.formula(),
                step.method() == null ? "" : step.method(), format.trailValue(step.value(), step.unit()), inputs,
                indexed.table(), indexed.others());
    }
}
