package org.meritbook.serve;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Exclusion;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * Which workbook cells of one run the page may exclude or restore, per section: a cell may be
 * excluded when the section's trail cites it (its statistics read it), and a row is restored by
 * removing the notebook's exclusions that name one of its cells. Built once per successful run, so
 * a request is checked against the run the page shows, never against the notebook's text.
 */
record PointIndex(Map<String, Section> sections) {
    PointIndex {
        sections = Map.copyOf(sections);
    }

    /**
     * @param cited      cell addresses the section's trail steps name as a source
     * @param rowOf      each table cell's address and its row (0-based, in table order)
     * @param rows       each row's cell addresses
     * @param exclusions the notebook's exclusion entries of the cell
     */
    record Section(Set<String> cited, Map<String, Integer> rowOf, List<List<String>> rows, List<Exclusion> exclusions) {
        Section {
            cited = Set.copyOf(cited);
            rowOf = Map.copyOf(rowOf);
            rows = rows.stream().map(List::copyOf).toList();
            exclusions = List.copyOf(exclusions);
        }

        /** The notebook exclusions that leave out the row holding {@code address}. */
        List<Exclusion> excluding(String address) {
            Integer row = rowOf.get(address);
            if (row == null) {
                return List.of();
            }
            List<String> cells = rows.get(row);
            return exclusions.stream().filter(e -> cells.contains(e.address())).toList();
        }
    }

    static PointIndex of(StudyResults results) {
        Map<String, Section> sections = new LinkedHashMap<>();
        for (SectionResult s : results.sections()) {
            Set<String> cited = s.steps().stream().map(Step::inputs).flatMap(List::stream).map(StepInput::source)
                    .filter(source -> source != null && source.indexOf('!') > 0).collect(Collectors.toSet());
            Map<String, Integer> rowOf = new HashMap<>();
            List<List<String>> rows = new java.util.ArrayList<>();
            DataTable table = s.table();
            if (table != null) {
                for (DataTable.Row row : table.rows()) {
                    List<String> cells = row.cells().stream().map(TableCell::address)
                            .filter(a -> a != null && !a.isEmpty()).toList();
                    for (String a : cells) {
                        rowOf.putIfAbsent(a, rows.size());
                    }
                    rows.add(cells);
                }
            }
            List<Exclusion> exclusions = results.study().cell(s.id()).map(AnalysisCell::exclusions).orElse(List.of());
            sections.put(s.id(), new Section(cited, rowOf, rows, exclusions));
        }
        return new PointIndex(sections);
    }

    Optional<Section> section(String id) {
        return Optional.ofNullable(sections.get(id));
    }
}
