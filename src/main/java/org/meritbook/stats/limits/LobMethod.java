package org.meritbook.stats.limits;

/** How the limit of blank is estimated from blank results. */
public enum LobMethod {
    /** Mean + 1.645·SD: assumes normally distributed blank results. */
    PARAMETRIC,
    /** The 95th percentile by rank, with interpolation: no distribution assumed. */
    NON_PARAMETRIC
}
