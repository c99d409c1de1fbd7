package org.meritbook.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Thinning keeps a large series' outline (each column's lowest and highest point) and leaves small figures alone. */
class ThinningTest {
    private static FigureSpec cloud(int n, long seed) {
        Random random = new Random(seed);
        double[] x = new double[n];
        double[] y = new double[n];
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            x[i] = 1 + i / 50; // 50 results per run, as in a precision study
            y[i] = random.nextGaussian();
            notes.add("point " + i);
        }
        return new FigureSpec("cloud", "Cloud", "Run", "Value", List.of(new FigureSpec.Series("Results", FigureSpec.Style.POINTS, x, y,
                notes)));
    }

    @Test
    void aSeriesUpToTheLimitIsDrawnWhole() {
        FigureSpec small = cloud(Thinning.MAX_POINTS, 1);
        assertSame(small, Thinning.of(small));
        assertEquals("", Thinning.describe(small, small));
    }

    @Test
    void aLargeSeriesKeepsEachColumnsExtremesInOrder() {
        FigureSpec big = cloud(100_000, 2);
        FigureSpec drawn = Thinning.of(big);
        FigureSpec.Series s = drawn.series().get(0);
        assertTrue(s.x().length <= 2 * Thinning.COLUMNS, "at most two points per column: " + s.x().length);
        double[] y = big.series().get(0).y();
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : y) {
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        double keptMin = Double.POSITIVE_INFINITY;
        double keptMax = Double.NEGATIVE_INFINITY;
        for (double v : s.y()) {
            keptMin = Math.min(keptMin, v);
            keptMax = Math.max(keptMax, v);
        }
        assertEquals(min, keptMin, 0.0);
        assertEquals(max, keptMax, 0.0);
        for (int i = 1; i < s.x().length; i++) {
            assertTrue(s.x()[i] >= s.x()[i - 1], "original order kept");
        }
        assertEquals(s.x().length, s.notes().size());
        assertEquals(String.format(java.util.Locale.ROOT, "Results: 100,000 points, %,d drawn", s.x().length),
                Thinning.describe(big, drawn));
    }

    @Test
    void aThinnedFigureDrawsToAFewHundredKilobytes() {
        String svg = new SvgChartRenderer().render(Thinning.of(cloud(100_000, 3)));
        assertTrue(svg.length() < 1_000_000, "SVG of " + svg.length() + " characters");
    }

    @Test
    void aCategoricalAxisOfManyRunsShowsPositionsNotOverprintedNames() {
        int runs = SvgChartRenderer.MAX_NAMED_CATEGORIES + 960;
        double[] x = new double[runs];
        double[] y = new double[runs];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < runs; i++) {
            x[i] = i + 1;
            y[i] = Math.sin(i);
            names.add(String.format(java.util.Locale.ROOT, "R%04d", i + 1));
        }
        FigureSpec spec = new FigureSpec("runs", "Runs", "Run", "Value",
                List.of(new FigureSpec.Series("Means", FigureSpec.Style.LINE, x, y)), names);
        String svg = new SvgChartRenderer().render(spec);
        assertTrue(svg.length() < 1_000_000, "SVG of " + svg.length() + " characters");
    }
}
