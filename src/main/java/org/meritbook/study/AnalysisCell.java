package org.meritbook.study;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A fenced analysis cell.
 *
 * @param id         the cell id ({@code id:} option, or the kind numbered from the second cell on)
 * @param kind       the analysis kind
 * @param title      the nearest preceding Markdown heading, or the id when there is none
 * @param line       the notebook line of the opening fence
 * @param options    options by name, in notebook order, validated against the kind
 * @param exclusions the {@code exclude:} entries, parsed
 */
public record AnalysisCell(String id, AnalysisKind kind, String title, int line,
                           Map<String, OptionValue> options, List<Exclusion> exclusions) implements StudyElement {
    public AnalysisCell {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(kind, "kind");
        options = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(options));
        exclusions = List.copyOf(exclusions);
    }

    /** The default {@code role:}: the cell's verdicts count towards the study's outcome. */
    public static final String REPORTING = "reporting";
    /** {@code role: supporting}: a check beside the reporting cells, judged but not counted. */
    public static final String SUPPORTING = "supporting";

    /** True when the notebook marks this cell {@code role: supporting}. */
    public boolean supporting() {
        return option("role").map(v -> SUPPORTING.equals(v.text())).orElse(false);
    }

    public Optional<OptionValue> option(String name) {
        return Optional.ofNullable(options.get(name));
    }

    /** The cell's {@code data:} reference, when it has one, carrying the cell's reading options. */
    public Optional<DataReference> dataReference() {
        return option("data").map(DataReferences::parse).map(r -> r.withReading(reading()));
    }

    /**
     * The {@code data:} reference of a nested data set ({@code blanks}, {@code spikes},
     * {@code low-samples}), when the cell has that set; the cell's reading options apply to it too.
     */
    public Optional<DataReference> dataReference(String dataSet) {
        return option(dataSet).filter(v -> v.value() instanceof Map)
                .flatMap(v -> Optional.ofNullable(v.map().get("data"))).map(DataReferences::parse)
                .map(r -> r.withReading(reading()));
    }

    /** How this cell's data are read: its {@code formulas}, {@code hidden} and {@code merged} options. */
    public ReadingOptions reading() {
        return ReadingOptions.of(options);
    }

    /** The notebook line of an option, or the cell's line when the option is absent. */
    public int lineOf(String name) {
        OptionValue v = options.get(name);
        return v == null ? line : v.line();
    }
}
