package org.meritbook.dossier;

import java.util.Objects;

/**
 * Markup that the dossier produced itself and already made safe (narrative rendered with raw HTML
 * escaped, SVG from our chart renderer). The only values templates print without escaping.
 */
public record Markup(String html) {
    public Markup {
        Objects.requireNonNull(html, "html");
    }

    public boolean isEmpty() {
        return html.isBlank();
    }
}
