package org.meritbook.dossier;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;
import org.meritbook.figures.FigureSpec;

/**
 * The drawings a renderer made lately, by their figures' full content, so that a live re-run whose
 * figures did not change (an edited narrative, a renamed section) draws none of them again. A
 * drawing is a pure function of its figure (SvgChartRenderer), so a hit gives the bytes a new
 * drawing would. The key is the figure written out whole as JSON, every component and every
 * coordinate to the last bit (shortest round-trip decimals), so a different figure never hits.
 */
final class FigureCache {
    /** About two dossiers' worth of figures; older drawings are dropped first. */
    static final int CAPACITY = 64;
    private static final ObjectMapper KEYS = new ObjectMapper();

    private final Function<FigureSpec, String> draw;
    private final Map<String, String> drawings = new LinkedHashMap<>(CAPACITY, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, String> eldest) {
            return size() > CAPACITY;
        }
    };

    FigureCache(Function<FigureSpec, String> draw) {
        this.draw = draw;
    }

    String drawing(FigureSpec spec) {
        String key = key(spec);
        synchronized (drawings) {
            String known = drawings.get(key);
            if (known != null) {
                return known;
            }
        }
        String svg = draw.apply(spec);
        synchronized (drawings) {
            drawings.put(key, svg);
        }
        return svg;
    }

    static String key(FigureSpec spec) {
        try {
            return KEYS.writeValueAsString(spec);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("figure " + spec.id() + " could not be written out as a cache key", e);
        }
    }
}
