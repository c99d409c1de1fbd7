package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.SectionResult;
import org.meritbook.dossier.DossierView.StepInputRow;
import org.meritbook.dossier.DossierView.StepView;
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

    private final DisplayFormatter format;
    private final Map<String, StepRef> refs = new HashMap<>();
    private final List<SectionResult> sections;
    private final String letter;

    TrailViewBuilder(List<SectionResult> sections, String letter, DisplayFormatter format) {
        this.sections = sections;
        this.letter = letter;
        this.format = format;
        int anchor = 0;
        for (int s = 0; s < sections.size(); s++) {
            List<Step> steps = sections.get(s).steps();
            for (int i = 0; i < steps.size(); i++) {
                String id = steps.get(i).id();
                if (refs.putIfAbsent(id, new StepRef(letter + "." + (s + 1) + "." + (i + 1), "step-" + (++anchor)))
                        != null) {
                    throw new IllegalArgumentException("trail step id " + id + " is not unique");
                }
            }
        }
    }

    /** The step's reference, or a blank one when the id names no step. */
    StepRef ref(String stepId) {
        return refs.getOrDefault(stepId, new StepRef("", ""));
    }

    List<TrailGroup> groups() {
        List<TrailGroup> out = new ArrayList<>();
        for (int s = 0; s < sections.size(); s++) {
            SectionResult section = sections.get(s);
            List<StepView> steps = new ArrayList<>();
            for (Step step : section.steps()) {
                steps.add(view(step));
            }
            out.add(new TrailGroup(letter + "." + (s + 1), section.title() == null ? section.id() : section.title(),
                    "trail-" + (s + 1), steps, TrailLayout.blocks(steps)));
        }
        return out;
    }

    private StepView view(Step step) {
        StepRef ref = refs.get(step.id());
        List<StepInputRow> inputs = new ArrayList<>();
        for (StepInput in : step.inputs()) {
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
