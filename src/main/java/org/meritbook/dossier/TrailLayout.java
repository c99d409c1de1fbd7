package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.dossier.DossierView.CompactRow;
import org.meritbook.dossier.DossierView.IndexCell;
import org.meritbook.dossier.DossierView.IndexColumn;
import org.meritbook.dossier.DossierView.IndexRow;
import org.meritbook.dossier.DossierView.IndexedInputs;
import org.meritbook.dossier.DossierView.StepInputRow;
import org.meritbook.dossier.DossierView.StepView;
import org.meritbook.dossier.DossierView.TrailBlock;

/**
 * Lays the calculation trail out compactly without leaving anything out: steps that repeat one
 * formula with the same input names (one per calibration point, say) become one table with a row
 * per step, and a step's indexed inputs ({@code x1, y1, w1, x2 …}) become a table by index.
 */
final class TrailLayout {
    /** A table with more differing inputs than this would be too wide; such steps stay in full. */
    private static final int MAX_COLUMNS = 4;
    /** Indexed inputs are tabulated from this many on. */
    private static final int MIN_INDEXED = 8;
    private static final Pattern INDEXED = Pattern.compile("^(\\p{L}[\\p{L}\\p{M}_']*)(?:\\[(\\d+)\\]|(\\d+))$");

    /** A step's inputs split into the table by index and the rest. */
    record Indexed(IndexedInputs table, List<StepInputRow> others) {
    }

    private TrailLayout() {
    }

    /**
     * Groups a section's steps. Within a run of consecutive steps whose signature (formula, method and
     * input names) recurs in the section, the steps are gathered by signature in order of first
     * appearance; a signature with two steps or more becomes one compact table. Every step lands in
     * exactly one block.
     */
    static List<TrailBlock> blocks(List<StepView> steps) {
        Map<String, Integer> count = new HashMap<>();
        for (StepView s : steps) {
            count.merge(signature(s), 1, Integer::sum);
        }
        List<TrailBlock> out = new ArrayList<>();
        int i = 0;
        while (i < steps.size()) {
            if (count.get(signature(steps.get(i))) < 2) {
                out.add(single(steps.get(i)));
                i++;
                continue;
            }
            Map<String, List<StepView>> run = new LinkedHashMap<>();
            while (i < steps.size() && count.get(signature(steps.get(i))) >= 2) {
                run.computeIfAbsent(signature(steps.get(i)), k -> new ArrayList<>()).add(steps.get(i));
                i++;
            }
            for (List<StepView> group : run.values()) {
                if (group.size() < 2) {
                    out.add(single(group.get(0)));
                } else {
                    out.addAll(compact(group));
                }
            }
        }
        return out;
    }

    private static String signature(StepView s) {
        StringBuilder b = new StringBuilder(s.formula()).append('\u0000').append(s.method());
        for (StepInputRow in : s.inputs()) {
            b.append('\u0000').append(in.name());
        }
        return b.toString();
    }

    private static TrailBlock single(StepView s) {
        return new TrailBlock(false, s, s.label(), s.formula(), s.method(), List.of(), List.of(), false, List.of());
    }

    private static List<TrailBlock> compact(List<StepView> group) {
        StepView first = group.get(0);
        int n = first.inputs().size();
        List<Integer> varying = new ArrayList<>();
        List<StepInputRow> common = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            StepInputRow a = first.inputs().get(k);
            boolean same = true;
            for (StepView s : group) {
                StepInputRow b = s.inputs().get(k);
                same &= a.value().equals(b.value()) && a.source().equals(b.source());
            }
            if (same) {
                common.add(a);
            } else {
                varying.add(k);
            }
        }
        if (varying.size() > MAX_COLUMNS || first.indexed().present()) {
            return group.stream().map(TrailLayout::single).toList();
        }
        String prefix = commonLabel(group);
        List<String> columns = varying.stream().map(k -> first.inputs().get(k).name()).toList();
        List<CompactRow> rows = new ArrayList<>();
        boolean points = false;
        for (StepView s : group) {
            String point = s.label().equals(prefix) ? "" : s.label().substring(prefix.isEmpty() ? 0 : prefix.length() + 2);
            points |= !point.isEmpty();
            rows.add(new CompactRow(s.number(), s.anchor(), s.id(), point,
                    varying.stream().map(k -> s.inputs().get(k)).toList(), s.value()));
        }
        return List.of(new TrailBlock(true, first, prefix, first.formula(), first.method(), common, columns, points,
                rows));
    }

    /** The labels' shared part up to their last ", " (e.g. "Back-calculated concentration"), or the label itself. */
    private static String commonLabel(List<StepView> group) {
        String p = group.get(0).label();
        for (StepView s : group) {
            String l = s.label();
            int k = 0;
            while (k < p.length() && k < l.length() && p.charAt(k) == l.charAt(k)) {
                k++;
            }
            if (k == p.length() && k == l.length()) {
                continue;
            }
            p = p.substring(0, k);
        }
        boolean allSame = group.stream().allMatch(s -> s.label().equals(group.get(0).label()));
        if (allSame) {
            return p;
        }
        int cut = p.lastIndexOf(", ");
        return cut > 0 ? p.substring(0, cut) : "";
    }

    /** Tabulates inputs named symbol+index when at least two symbols share indices; else returns all as others. */
    static Indexed indexed(List<StepInputRow> inputs) {
        Map<String, Map<String, StepInputRow>> bySymbol = new LinkedHashMap<>();
        Map<String, Boolean> indices = new LinkedHashMap<>();
        List<StepInputRow> others = new ArrayList<>();
        for (StepInputRow in : inputs) {
            Matcher m = INDEXED.matcher(in.name());
            if (!m.matches()) {
                others.add(in);
                continue;
            }
            String index = m.group(2) != null ? m.group(2) : m.group(3);
            Map<String, StepInputRow> cells = bySymbol.computeIfAbsent(m.group(1), k -> new LinkedHashMap<>());
            if (cells.putIfAbsent(index, in) != null) {
                others.add(in); // a repeated name: keep it, listed on its own
                continue;
            }
            indices.put(index, Boolean.TRUE);
        }
        long tabulated = bySymbol.values().stream().mapToInt(Map::size).sum();
        long symbolsWithRows = bySymbol.values().stream().filter(c -> c.size() >= 3).count();
        if (tabulated < MIN_INDEXED || symbolsWithRows < 2) {
            return new Indexed(new IndexedInputs(false, List.of(), List.of()), inputs);
        }
        List<IndexColumn> columns = new ArrayList<>();
        for (Map.Entry<String, Map<String, StepInputRow>> e : bySymbol.entrySet()) {
            List<StepInputRow> cells = List.copyOf(e.getValue().values());
            boolean shared = cells.stream().allMatch(c -> c.source().equals(cells.get(0).source()))
                    && e.getValue().size() == indices.size();
            columns.add(shared ? new IndexColumn(e.getKey(), cells.get(0).source(), cells.get(0).sourceAnchor())
                    : new IndexColumn(e.getKey(), "", ""));
        }
        List<IndexRow> rows = new ArrayList<>();
        for (String index : indices.keySet()) {
            List<IndexCell> cells = new ArrayList<>();
            int c = 0;
            for (Map<String, StepInputRow> symbol : bySymbol.values()) {
                StepInputRow in = symbol.get(index);
                boolean shared = !columns.get(c++).source().isEmpty();
                cells.add(in == null ? new IndexCell("", "", "")
                        : new IndexCell(in.value(), shared ? "" : in.source(), shared ? "" : in.sourceAnchor()));
            }
            rows.add(new IndexRow(index, cells));
        }
        return new Indexed(new IndexedInputs(true, columns, rows), others);
    }
}
