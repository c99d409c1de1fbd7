package org.meritbook.analysis.detection;

/**
 * What one evaluated method contributes to the comparison table.
 *
 * @param method    the method's notebook word
 * @param unit      the unit of its limits
 * @param basis     what it was computed from, in a few words
 * @param procedure the procedure's name
 * @param hasLoq    whether it reports {@code loq:<method>}
 * @param hasCritical whether it reports {@code critical_value:<method>}
 */
record LimitRow(String method, String unit, String basis, String procedure, boolean hasLoq, boolean hasCritical) {
}
