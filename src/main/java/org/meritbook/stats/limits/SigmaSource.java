package org.meritbook.stats.limits;

/** Where σ of ICH Q2's 3.3σ/S comes from. */
public enum SigmaSource {
    /** The SD of blank responses. */
    BLANK_SD,
    /** The residual SD s(y/x) of the calibration line. */
    RESIDUAL_SD,
    /** The standard error of the calibration intercept. */
    INTERCEPT_SE
}
