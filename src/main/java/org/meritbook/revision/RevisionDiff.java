package org.meritbook.revision;

import java.util.List;

/**
 * What changed between two runs of a study: inputs whose checksum changed, workbook cells whose value
 * changed (as the trail cites them), statistical choices, and results whose value changed.
 *
 * @param before  label of the older run (its file name)
 * @param after   label of the newer run
 * @param inputs  changed, added or removed input files
 * @param cells    changed, added or removed input cells
 * @param settings changed statistical choices per section (model, weighting, …)
 * @param results  changed, added or removed quantities
 */
public record RevisionDiff(String before, String after, List<Change> inputs, List<Change> cells, List<Change> settings,
                           List<Change> results) {
    public RevisionDiff {
        inputs = List.copyOf(inputs);
        cells = List.copyOf(cells);
        settings = List.copyOf(settings);
        results = List.copyOf(results);
    }

    public boolean identical() {
        return inputs.isEmpty() && cells.isEmpty() && settings.isEmpty() && results.isEmpty();
    }

    /**
     * One difference.
     *
     * @param what   the input alias, the cell address ({@code Calibration!D16}) or {@code section.quantity}
     * @param before the old value as text, or null when added
     * @param after  the new value as text, or null when removed
     */
    public record Change(String what, String before, String after) {
        public String describe() {
            if (before == null) {
                return what + ": added, " + after;
            }
            if (after == null) {
                return what + ": removed (was " + before + ")";
            }
            return what + ": " + before + " → " + after;
        }
    }
}
