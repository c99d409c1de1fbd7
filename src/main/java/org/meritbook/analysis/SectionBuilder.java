package org.meritbook.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.figures.FigureSpec;
import org.meritbook.stats.Interval;
import org.meritbook.study.AnalysisCell;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * Collects one section's quantities and their trail steps in computation order, so that every
 * quantity is born with its step (ids {@code <section>.<name>}).
 */
public final class SectionBuilder {
    private final AnalysisCell cell;
    private final List<Setting> settings = new ArrayList<>();
    private final List<Quantity> quantities = new ArrayList<>();
    private final List<Step> steps = new ArrayList<>();
    /** The first step recorded under each id: a section over 1,000 groups refers back to 2,000 steps. */
    private final Map<String, Step> stepsById = new HashMap<>();
    private final List<FigureSpec> figures = new ArrayList<>();
    private final List<Verdict> verdicts = new ArrayList<>();
    private final List<String> warnings = new ArrayList<>();
    private final List<Exported> exports = new ArrayList<>();
    private final java.util.Map<String, Double> nominals = new java.util.LinkedHashMap<>();
    private final List<ResultTable> tables = new ArrayList<>();

    public SectionBuilder(AnalysisCell cell) {
        this.cell = cell;
    }

    public String stepId(String name) {
        return cell.id() + "." + name;
    }

    public SectionBuilder setting(String label, String value) {
        settings.add(new Setting(label, value));
        return this;
    }

    /** A setting that is a notebook choice: rules match its {@code key}, the dossier shows {@code value}. */
    public SectionBuilder setting(String label, String value, String key) {
        settings.add(new Setting(label, value, key));
        return this;
    }

    /** An intermediate step that is not itself a reported quantity (a weighted mean, a sum of squares). */
    public String step(String name, String label, String formula, List<StepInput> inputs, double value, String unit,
                       String method) {
        String id = stepId(name);
        Step step = new Step(id, label, formula, inputs, value, unit, method);
        steps.add(step);
        stepsById.putIfAbsent(id, step);
        return id;
    }

    /** A reported quantity together with the step that computed it. */
    public String quantity(QuantityDraft q) {
        String id = step(q.name(), q.label(), q.formula(), q.inputs(), q.value(), q.unit(), q.method());
        quantities.add(new Quantity(q.name(), q.label(), q.value(), q.unit(), id, q.interval(), q.summary(), q.kind()));
        return id;
    }

    /** An input that is the value of an earlier step of this section, named by its symbol. */
    public StepInput ref(String symbol, String stepId) {
        Step step = stepsById.get(stepId);
        if (step == null) {
            throw new IllegalStateException("no step " + stepId + " recorded yet");
        }
        return StepInput.number(symbol, step.value(), step.unit(), stepId);
    }

    public boolean hasQuantity(String name) {
        return quantities.stream().anyMatch(q -> q.name().equals(name));
    }

    public SectionBuilder figure(FigureSpec figure) {
        figures.add(figure);
        return this;
    }

    public SectionBuilder verdict(Verdict verdict) {
        verdicts.add(verdict);
        return this;
    }

    public SectionBuilder warning(String text) {
        warnings.add(text);
        return this;
    }

    /** A table shown after the data table; its cells name quantities and steps already recorded. */
    public SectionBuilder table(ResultTable table) {
        tables.add(table);
        return this;
    }

    /** A table placed before the tables added so far (a summary of what the per-level tables detail). */
    public SectionBuilder tableFirst(ResultTable table) {
        tables.add(0, table);
        return this;
    }

    /**
     * The nominal value behind the members labelled {@code label} ({@code deviation_percent:<label>}),
     * exported as {@link NominalValues} for the rules that set the lowest calibration standard apart.
     */
    public SectionBuilder nominal(String label, double value) {
        if (Double.isFinite(value)) {
            nominals.put(label, value);
        }
        return this;
    }

    /** A typed result later cells may use. */
    public SectionBuilder export(Exported result) {
        exports.add(result);
        return this;
    }

    /**
     * An input that is a quantity of an earlier cell: the trail links to that cell's step, so a
     * reviewer follows a detection limit back to the slope it divides by.
     */
    public static StepInput fromEarlier(String symbol, Quantity quantity) {
        return StepInput.number(symbol, quantity.value(), quantity.unit(), quantity.stepId());
    }

    public SectionResult build(DataTable table) {
        List<Exported> all = new ArrayList<>(exports);
        if (!nominals.isEmpty()) {
            all.add(new NominalValues(nominals));
        }
        return new SectionResult(cell.id(), cell.kind(), cell.title(), settings, quantities, steps, table, tables,
                figures, verdicts, warnings, all);
    }

    /**
     * A quantity about to be recorded.
     *
     * @param name     results.json name
     * @param label    plain-language label
     * @param formula  plain-notation formula
     * @param inputs   named inputs with sources
     * @param value    value
     * @param unit     unit or null
     * @param method   reference or null
     * @param interval confidence interval or null
     * @param summary  shown in the dossier's summary
     * @param kind     what kind of number it is (sets its display rounding)
     */
    public record QuantityDraft(String name, String label, String formula, List<StepInput> inputs, double value,
                                String unit, String method, Interval interval, boolean summary, NumberKind kind) {
        /** A draft whose kind its unit tells (a percentage or a measure); say otherwise with {@link #as}. */
        public static QuantityDraft of(String name, String label, String formula, List<StepInput> inputs,
                                       double value, String unit) {
            return new QuantityDraft(name, label, formula, inputs, value, unit, null, null, false,
                    NumberKind.ofUnit(unit));
        }

        public QuantityDraft withInterval(Interval ci) {
            return new QuantityDraft(name, label, formula, inputs, value, unit, method, ci, summary, kind);
        }

        public QuantityDraft inSummary() {
            return new QuantityDraft(name, label, formula, inputs, value, unit, method, interval, true, kind);
        }

        public QuantityDraft withMethod(String reference) {
            return new QuantityDraft(name, label, formula, inputs, value, unit, reference, interval, summary, kind);
        }

        /** The same draft as this kind of number (a count, a p-value, a test statistic…). */
        public QuantityDraft as(NumberKind numberKind) {
            return new QuantityDraft(name, label, formula, inputs, value, unit, method, interval, summary, numberKind);
        }
    }
}
