package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/** Where two JSON trees differ, as {@code $.path: recorded X, re-run gives Y}, in document order. */
final class JsonDifferences {
    private JsonDifferences() {
    }

    static List<String> of(JsonNode recorded, JsonNode rerun, int max) {
        List<String> out = new ArrayList<>();
        walk("$", recorded, rerun, out, max);
        return out;
    }

    private static void walk(String path, JsonNode a, JsonNode b, List<String> out, int max) {
        if (out.size() >= max || (a != null && a.equals(b))) {
            return;
        }
        if (a != null && b != null && a.isObject() && b.isObject()) {
            Set<String> names = new LinkedHashSet<>();
            a.fieldNames().forEachRemaining(names::add);
            b.fieldNames().forEachRemaining(names::add);
            for (Iterator<String> it = names.iterator(); it.hasNext() && out.size() < max; ) {
                String n = it.next();
                walk(path + "." + n, a.get(n), b.get(n), out, max);
            }
        } else if (a != null && b != null && a.isArray() && b.isArray()) {
            for (int i = 0; i < Math.max(a.size(), b.size()) && out.size() < max; i++) {
                walk(path + "[" + i + "]", a.get(i), b.get(i), out, max);
            }
        } else {
            out.add("results.json " + path + ": recorded " + shown(a) + ", re-run gives " + shown(b));
        }
    }

    private static String shown(JsonNode n) {
        if (n == null) {
            return "nothing";
        }
        String s = n.toString();
        return s.length() > 80 ? s.substring(0, 80) + "…" : s;
    }
}
