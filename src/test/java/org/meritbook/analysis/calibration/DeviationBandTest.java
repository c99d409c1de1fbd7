package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AcceptanceBands;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.criteria.DeviationRule;
import org.meritbook.criteria.ProfileBands;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/**
 * The back-calculated deviation figure draws the limits of the profile judging the section, read
 * here from the SVG drawn: each dotted line's height converted back to % through the zero line and
 * a drawn standard whose deviation the figure states.
 */
class DeviationBandTest {
    /** Miller & Miller fluorescence calibration (handbook worked example, from memory). */
    private static final double[] X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
    /** The renderer's colours (figures.Palette): dotted limits, the zero reference, the points. */
    private static final String DOTTED = "stroke:rgb(110,92,148)";
    private static final String REFERENCE = "stroke:rgb(140,146,152)";
    private static final Pattern LINE = Pattern.compile("<line style=\"([^\"]*)\" x1=\"([-0-9.]+)\" x2=\"([-0-9.]+)\" "
            + "y1=\"([-0-9.]+)\" y2=\"([-0-9.]+)\"/>");
    private static final Pattern POINT = Pattern.compile("<ellipse cx=\"([-0-9.]+)\" cy=\"([-0-9.]+)\"[^>]*fill:rgb\\(31,90,133\\)");

    /** A horizontal line segment as drawn, in data units: from x1 to x2 at height y. */
    record Segment(double x1, double x2, double y) {
    }

    @Test
    void aTenPercentProfileDrawsATenPercentBand() {
        FigureSpec figure = deviationFigure(bands(10, 10));
        List<Segment> limits = drawnLimits(figure);
        assertEquals(2, limits.size(), limits.toString());
        assertEquals(10.0, limits.get(0).y(), 0.01);
        assertEquals(-10.0, limits.get(1).y(), 0.01);
        for (Segment s : limits) {
            // across the calibrated span, 0 to 12 ng/mL
            assertEquals(0.0, s.x1(), 0.01);
            assertEquals(12.0, s.x2(), 0.01);
        }
        assertTrue(names(figure).contains("Acceptance limit ±10 % (profile lab-10)"), names(figure).toString());
    }

    @Test
    void theLowestLevelLimitIsDrawnAtTheLowestLevelOnly() {
        FigureSpec figure = deviationFigure(bands(10, 20));
        List<Segment> limits = drawnLimits(figure);
        // 20 % from 0 to halfway between the lowest judged level (2) and the next (4), then 10 %.
        assertEquals(List.of(20.0, 10.0, -20.0, -10.0), limits.stream().map(s -> Math.round(s.y() * 100) / 100.0).toList(),
                limits.toString());
        assertEquals(3.0, limits.get(0).x2(), 0.01);
        assertEquals(3.0, limits.get(1).x1(), 0.01);
        assertEquals(12.0, limits.get(1).x2(), 0.01);
        assertTrue(names(figure).contains("Acceptance limit ±10 %, ±20 % at the lowest level (profile lab-10)"));
    }

    @Test
    void withoutADeviationRuleTheGuideSaysItIsCommonPractice() {
        FigureSpec figure = deviationFigure(AcceptanceBands.NONE);
        List<Segment> limits = drawnLimits(figure);
        assertEquals(15.0, limits.get(0).y(), 0.01);
        assertEquals(-15.0, limits.get(1).y(), 0.01);
        assertTrue(names(figure).stream().anyMatch(n -> n.startsWith("±15 % guide (common practice")), names(figure).toString());
        assertTrue(names(figure).stream().noneMatch(n -> n.startsWith("Acceptance")));
    }

    private static AcceptanceBands bands(double tolerance, double lowest) {
        return ProfileBands.of(new AcceptanceProfile("lab-10", "a laboratory's calibration limits", "lab-10.yaml",
                List.of(new DeviationRule("Back-calculated standards", tolerance, lowest, 1.0, "test limit"))));
    }

    private static List<String> names(FigureSpec figure) {
        return figure.series().stream().map(FigureSpec.Series::name).toList();
    }

    private static FigureSpec deviationFigure(AcceptanceBands bands) {
        Study study = StudyParser.parse("""
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ## Linearity

                ```calibration
                data: runs!Cal!A1:B8
                x: Conc
                y: Signal
                ```
                """, Path.of("study.md"));
        List<CellValue> xv = new ArrayList<>();
        List<CellValue> yv = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            xv.add(new CellValue(new CellRef("Cal", i + 1, 0), CellValue.Kind.NUMBER, X[i], Double.toString(X[i]), null));
            yv.add(new CellValue(new CellRef("Cal", i + 1, 1), CellValue.Kind.NUMBER, Y[i], Double.toString(Y[i]), null));
        }
        DataBlock block = new DataBlock(Path.of("runs.xlsx"), "Cal", "A1:B8",
                List.of(new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", xv),
                        new Column("Signal (counts)", "Signal", "counts", "B", yv)), List.of());
        SectionResult s = new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block, bands));
        return s.figures().stream().filter(f -> f.id().endsWith(".deviation")).findFirst().orElseThrow();
    }

    /**
     * The horizontal dotted lines of the plot (not the legend), in data units, in drawing order. The
     * scale comes from the drawing itself: the zero line gives the pixel of 0 %, and the first and last
     * standard drawn give the pixels of their stated deviation and concentration.
     */
    private static List<Segment> drawnLimits(FigureSpec figure) {
        String svg = new SvgChartRenderer().render(figure);
        String plot = svg.substring(0, svg.indexOf("<g class=\"legend\">"));
        FigureSpec.Series points = figure.series().get(0);
        List<double[]> drawn = new ArrayList<>();
        Matcher p = POINT.matcher(plot);
        while (p.find()) {
            drawn.add(new double[] {Double.parseDouble(p.group(1)), Double.parseDouble(p.group(2))});
        }
        assertEquals(points.x().length, drawn.size(), "every standard is drawn");
        double zeroPx = Double.NaN;
        List<double[]> dotted = new ArrayList<>();
        Matcher m = LINE.matcher(plot);
        while (m.find()) {
            double[] l = {Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3)), Double.parseDouble(m.group(4)),
                Double.parseDouble(m.group(5))};
            if (m.group(1).contains(REFERENCE)) {
                zeroPx = l[2];
            } else if (m.group(1).contains(DOTTED) && l[2] == l[3]) {
                dotted.add(l);
            }
        }
        int last = drawn.size() - 1;
        double zero = zeroPx;
        double yScale = (drawn.get(0)[1] - zero) / points.y()[0];
        double xScale = (drawn.get(last)[0] - drawn.get(0)[0]) / (points.x()[last] - points.x()[0]);
        double x0 = drawn.get(0)[0] - points.x()[0] * xScale;
        return dotted.stream().map(l -> new Segment((l[0] - x0) / xScale, (l[1] - x0) / xScale, (l[2] - zero) / yScale))
                .toList();
    }
}
