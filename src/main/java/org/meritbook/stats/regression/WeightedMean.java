package org.meritbook.stats.regression;

/** The weighted mean both least-squares fits centre on, computed in two passes for accuracy. */
final class WeightedMean {
    private WeightedMean() {
    }

    /**
     * Two-pass weighted mean: a first estimate, then the weighted mean deviation from it added back,
     * which recovers the digits a one-pass sum loses on data with a large common offset (NIST NumAcc).
     */
    static double of(double[] v, double[] w, double sumW) {
        double first = 0;
        for (int i = 0; i < v.length; i++) {
            first += w[i] * v[i];
        }
        first /= sumW;
        double correction = 0;
        for (int i = 0; i < v.length; i++) {
            correction += w[i] * (v[i] - first);
        }
        return first + correction / sumW;
    }
}
