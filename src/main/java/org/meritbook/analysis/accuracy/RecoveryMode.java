package org.meritbook.analysis.accuracy;

/** How a row's recovery is formed, stated as a setting and in the trail. */
enum RecoveryMode {
    /** measured / known × 100 */
    DIRECT("direct", "measured / known × 100"),
    /** (spiked − unspiked) / added × 100 with each spiked row's own unspiked portion */
    PAIRED("paired", "(spiked − unspiked) / added × 100, each spiked portion with its own unspiked portion"),
    /** (spiked − mean unspiked) / added × 100 when not every spiked row has an unspiked portion */
    AVERAGED("averaged", "(spiked − mean of the unspiked results) / added × 100; not every spiked portion has an "
            + "unspiked one, so the unspiked results are averaged");

    private final String key;
    private final String description;

    RecoveryMode(String key, String description) {
        this.key = key;
        this.description = description;
    }

    String key() {
        return key;
    }

    String description() {
        return description;
    }
}
