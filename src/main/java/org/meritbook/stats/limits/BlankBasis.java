package org.meritbook.stats.limits;

/** What plays the blank in a blank-based limit. */
public enum BlankBasis {
    /** Measured blank signals, converted to concentration through the calibration line. */
    BLANK_SIGNALS,
    /** Measured blank results already in concentration units: no conversion. */
    BLANK_CONCENTRATIONS,
    /**
     * The calibration itself: the intercept a as the blank signal and s(y/x) as its SD, the
     * treatment Miller &amp; Miller give (ch. 5) when no separate blanks were measured.
     */
    CALIBRATION_INTERCEPT
}
