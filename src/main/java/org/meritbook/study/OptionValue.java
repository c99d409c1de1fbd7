package org.meritbook.study;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One option value from an analysis cell, with the notebook line it was written on. The value is
 * one of: {@code String} (scalars are kept as the text written), {@code List<OptionValue>}, or
 * {@code Map<String, OptionValue>} (insertion-ordered) for nested data sets and exclusions.
 */
public record OptionValue(Object value, int line) {
    public OptionValue {
        Objects.requireNonNull(value, "value");
        if (!(value instanceof String || value instanceof List || value instanceof Map)) {
            throw new IllegalArgumentException("unsupported option value type " + value.getClass());
        }
    }

    public boolean isScalar() {
        return value instanceof String;
    }

    public String text() {
        if (value instanceof String s) {
            return s;
        }
        throw new IllegalStateException("option value at line " + line + " is not a scalar");
    }

    @SuppressWarnings("unchecked")
    public List<OptionValue> list() {
        if (value instanceof List<?> l) {
            return (List<OptionValue>) l;
        }
        throw new IllegalStateException("option value at line " + line + " is not a list");
    }

    @SuppressWarnings("unchecked")
    public Map<String, OptionValue> map() {
        if (value instanceof Map<?, ?> m) {
            return (Map<String, OptionValue>) m;
        }
        throw new IllegalStateException("option value at line " + line + " is not a map");
    }
}
