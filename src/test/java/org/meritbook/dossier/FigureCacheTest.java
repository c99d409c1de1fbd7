package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;

class FigureCacheTest {
    private final List<String> drawn = new ArrayList<>();
    private final FigureCache cache = new FigureCache(spec -> {
        drawn.add(spec.id());
        return "<svg>" + drawn.size() + "</svg>";
    });

    private static FigureSpec spec(String id, double lastY, String note, List<String> categories) {
        return new FigureSpec(id, "Title", "x", "y", List.of(new FigureSpec.Series("points", FigureSpec.Style.POINTS,
                new double[] {1, 2, 3}, new double[] {0.1, 0.2, lastY}, List.of("a", "b", note))), categories);
    }

    @Test
    void theSameContentInNewArraysIsDrawnOnce() {
        String first = cache.drawing(spec("f", 0.3, "c", List.of()));
        String again = cache.drawing(spec("f", 0.3, "c", List.of()));
        assertEquals(first, again);
        assertEquals(List.of("f"), drawn);
    }

    @Test
    void anyDifferenceDownToOneUlpOfOneCoordinateIsDrawnAnew() {
        cache.drawing(spec("f", 0.3, "c", List.of()));
        cache.drawing(spec("f", Math.nextUp(0.3), "c", List.of()));
        cache.drawing(spec("f", 0.3, "changed note", List.of()));
        cache.drawing(spec("f", 0.3, "c", List.of("Day 1", "Day 2", "Day 3")));
        cache.drawing(spec("g", 0.3, "c", List.of()));
        cache.drawing(spec("f", -0.0 + 0.3, "c", List.of())); // the first one again
        assertEquals(5, drawn.size(), drawn.toString());
        assertNotEquals(FigureCache.key(spec("f", 0.0, "c", List.of())), FigureCache.key(spec("f", -0.0, "c", List.of())));
        assertNotEquals(FigureCache.key(spec("f", Double.NaN, "c", List.of())), FigureCache.key(spec("f", 0.0, "c", List.of())));
    }

    @Test
    void theOldestDrawingsGoOnceTheCacheIsFull() {
        for (int i = 0; i <= FigureCache.CAPACITY; i++) {
            cache.drawing(spec("f" + i, 0.3, "c", List.of()));
        }
        cache.drawing(spec("f" + FigureCache.CAPACITY, 0.3, "c", List.of())); // newest: still there
        cache.drawing(spec("f0", 0.3, "c", List.of())); // oldest: dropped, drawn again
        assertEquals(FigureCache.CAPACITY + 2, drawn.size());
    }

    @Test
    void aCachedDrawingIsTheDrawingItself(@TempDir Path dir) {
        FigureSpec spec = DossierFixtures.results(dir, DossierFixtures.PLAIN).sections().get(0).figures().get(0);
        FigureCache real = new FigureCache(new SvgChartRenderer()::render);
        String first = real.drawing(spec);
        assertEquals(new SvgChartRenderer().render(spec), first);
        assertEquals(first, real.drawing(spec));
    }
}
