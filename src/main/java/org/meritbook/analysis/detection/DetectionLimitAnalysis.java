package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.study.AnalysisCell;

/**
 * Detection and quantitation limits (DESIGN §4) by every method the cell lists, side by side: one
 * table row per evaluated method; {@code lod} and {@code loq} are those of the first method listed.
 * A method the data cannot support is reported as not evaluable and the others go on; a notebook or
 * workbook error is a located error.
 */
public final class DetectionLimitAnalysis implements Analysis {
    private static final List<String> HEADERS =
            List.of("LOD", "LOQ", "Decision level", "Unit", "Computed from", "Procedure");

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        SectionBuilder section = new SectionBuilder(cell);
        DetectionInputs in = new DetectionInputs(cell, context, section);
        section.setting("Methods", String.join(", ", in.options().methods()));
        if (in.options().methods().contains(BlankMethod.NAME)) {
            section.setting("k (blank)", in.options().k() + " for the LOD, 10 for the LOQ");
        }
        List<LimitRow> rows = new ArrayList<>();
        for (String method : in.options().methods()) {
            try {
                rows.add(run(method, in));
            } catch (UnusableDataException e) {
                section.warning("Method " + method + " not evaluable, because " + e.getMessage() + ".");
            }
        }
        headline(section, in.options().methods().get(0), rows);
        String first = in.options().methods().get(0);
        LimitBounds.record(in, rows.stream().filter(r -> r.method().equals(first)).findFirst().map(LimitRow::unit)
                .orElse(null));
        DetectionFigures.addTo(in);
        return section.build(table(rows));
    }

    private static LimitRow run(String method, DetectionInputs in) {
        return switch (method) {
            case BlankMethod.NAME -> BlankMethod.record(in);
            case ResponseSdMethod.NAME -> ResponseSdMethod.record(in);
            case MdlMethod.NAME -> MdlMethod.record(in);
            case LobLodMethod.NAME -> LobLodMethod.record(in);
            case PredictionBandMethod.NAME -> PredictionBandMethod.record(in);
            case SignalNoiseMethod.NAME -> SignalNoiseMethod.record(in);
            default -> throw new IllegalStateException("the notebook parser admitted an unknown method " + method);
        };
    }

    /** {@code lod} and {@code loq}: the first method's, when it was evaluable. */
    private static void headline(SectionBuilder s, String first, List<LimitRow> rows) {
        LimitRow row = rows.stream().filter(r -> r.method().equals(first)).findFirst().orElse(null);
        if (row == null) {
            s.warning("lod and loq are not reported: they are the first method's (" + first + "), which was not "
                    + "evaluable.");
            return;
        }
        String lodId = s.stepId("lod:" + first);
        s.quantity(QuantityDraft.of("lod", "Limit of detection (" + first + ", the first method listed)",
                "lod = lod:" + first, List.of(s.ref("lod:" + first, lodId)), s.ref("v", lodId).value(), row.unit())
                .withMethod(row.procedure()).inSummary());
        if (row.hasLoq()) {
            String loqId = s.stepId("loq:" + first);
            s.quantity(QuantityDraft.of("loq", "Limit of quantitation (" + first + ", the first method listed)",
                    "loq = loq:" + first, List.of(s.ref("loq:" + first, loqId)), s.ref("v", loqId).value(), row.unit())
                    .withMethod(row.procedure()).inSummary());
        }
    }

    private static DataTable table(List<LimitRow> rows) {
        List<DataTable.Row> out = new ArrayList<>();
        for (LimitRow r : rows) {
            String none = "—";
            out.add(new DataTable.Row(r.method(), List.of(
                    TableCell.computed("lod:" + r.method()),
                    r.hasLoq() ? TableCell.computed("loq:" + r.method()) : TableCell.raw(none, null),
                    r.hasCritical() ? TableCell.computed("critical_value:" + r.method()) : TableCell.raw(none, null),
                    TableCell.raw(r.unit() == null ? "" : r.unit(), null),
                    TableCell.raw(r.basis(), null),
                    TableCell.raw(r.procedure(), null)), null));
        }
        return new DataTable(HEADERS, out);
    }
}
