package org.meritbook.stats.regression;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * The two-sided Student t quantile of a fit, t(0.5 + level/2, df), from Apache Commons Math,
 * remembered: a calibration's confidence and prediction bands ask for the same one at every point
 * drawn, and each costs a root search. A pure function, so remembering changes no digit.
 */
final class TwoSidedT {
    /** Integer degrees of freedom and a few confidence levels: a handful of keys per study. */
    private static final int REMEMBERED = 512;
    private static final Map<Key, Double> QUANTILES = new ConcurrentHashMap<>();

    private record Key(int degreesOfFreedom, double level, double accuracy) {
    }

    private TwoSidedT() {
    }

    /** @param accuracy the absolute accuracy of Commons Math's root search */
    static double quantile(int degreesOfFreedom, double level, double accuracy) {
        Key key = new Key(degreesOfFreedom, level, accuracy);
        Double known = QUANTILES.get(key);
        if (known != null) {
            return known;
        }
        double t = new TDistribution(null, degreesOfFreedom, accuracy).inverseCumulativeProbability(0.5 + level / 2);
        if (QUANTILES.size() >= REMEMBERED) {
            QUANTILES.clear();
        }
        QUANTILES.put(key, t);
        return t;
    }
}
