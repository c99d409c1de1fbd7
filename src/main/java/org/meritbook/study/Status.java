package org.meritbook.study;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BiFunction;
import org.meritbook.error.ErrorKey;

/**
 * The front matter's {@code status:}, one of a fixed set. A status that claims a sign-off needs the
 * sign-off it claims ({@code reviewed} needs {@code reviewed-by} and {@code reviewed-on};
 * {@code approved} needs both pairs), so the cover never states a review or an approval the
 * document does not carry.
 */
public enum Status {
    DRAFT("draft", "Draft: for review and approval"),
    FOR_REVIEW("for-review", "For review"),
    REVIEWED("reviewed", "Reviewed, not yet approved"),
    APPROVED("approved", "Approved");

    private final String keyword;
    private final String display;

    Status(String keyword, String display) {
        this.keyword = keyword;
        this.display = display;
    }

    public String keyword() {
        return keyword;
    }

    /** How the cover shows it. */
    public String display() {
        return display;
    }

    /** The status a front matter states: draft when it states none (the check has refused any other word). */
    public static Status of(FrontMatter fm) {
        Object s = fm.all() == null ? null : fm.all().get("status");
        if (s instanceof String text) {
            for (Status st : values()) {
                if (st.keyword.equals(text.strip().toLowerCase(Locale.ROOT))) {
                    return st;
                }
            }
        }
        return DRAFT;
    }

    /** The sign-off keys this status needs. */
    List<String> requiredKeys() {
        return switch (this) {
            case REVIEWED -> List.of("reviewed-by", "reviewed-on");
            case APPROVED -> List.of("reviewed-by", "reviewed-on", "approved-by", "approved-on");
            default -> List.of();
        };
    }

    static void check(Map<String, YamlSnippet.Entry> entries, BiFunction<Map<String, YamlSnippet.Entry>, String, String> scalar,
                      Problems problems) {
        YamlSnippet.Entry entry = entries.get("status");
        String written = scalar.apply(entries, "status");
        if (entry == null || written == null) {
            return;
        }
        List<String> words = java.util.Arrays.stream(values()).map(Status::keyword).toList();
        Status status = null;
        for (Status st : values()) {
            if (st.keyword.equals(written.strip().toLowerCase(Locale.ROOT))) {
                status = st;
            }
        }
        if (status == null) {
            problems.add(ErrorKey.FRONT_MATTER, entry.line(), "a status of " + String.join(", ", words),
                    Problems.quote(written) + Suggestion.hint(written, words),
                    "Write one of these words; a review or an approval also needs its '-by' and '-on' keys.");
            return;
        }
        for (String key : status.requiredKeys()) {
            String value = scalar.apply(entries, key);
            if (value == null) {
                problems.add(ErrorKey.FRONT_MATTER, entry.line(), "'" + key + ":' for status: " + status.keyword,
                        "no " + key + ": in the front matter",
                        "Add '" + key + ": " + (key.endsWith("-on") ? "yyyy-mm-dd" : "<name>")
                                + "', or state the status the document has reached.");
            } else if (key.endsWith("-on") && !value.matches("[0-9]{4}-[0-9]{2}-[0-9]{2}")) {
                problems.add(ErrorKey.FRONT_MATTER, entries.get(key).line(), "a date as yyyy-mm-dd for '" + key + "'",
                        Problems.quote(value), "Write the date in ISO form (year-month-day).");
            }
        }
    }
}
