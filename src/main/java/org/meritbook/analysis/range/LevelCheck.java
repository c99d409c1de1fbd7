package org.meritbook.analysis.range;

/**
 * One calibration level as the range judges it.
 *
 * @param x              the nominal concentration
 * @param n              standards at the level in the fit
 * @param deviation      mean % deviation of the back-calculated standards from x
 * @param responseFactor mean of y/x over the level's standards
 */
record LevelCheck(double x, int n, double deviation, double responseFactor) {
}
