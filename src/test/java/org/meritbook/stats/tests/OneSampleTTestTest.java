package org.meritbook.stats.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.stat.inference.TTest;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.Interval;
import org.meritbook.stats.UnusableDataException;

class OneSampleTTestTest {

    private static final double[] SULFUR = {0.112, 0.118, 0.115, 0.119};

    // Source: Miller & Miller, ch. 3, sulfur in kerosene against a known 0.123 % (from memory):
    // x̄ = 0.116, s = 0.0032, t = 4.43 (absolute value) > t(0.975; 3) = 3.18, so the bias is significant.
    @Test
    void sulfurExampleOfTheHandbook() {
        OneSampleTTest t = OneSampleTTest.of(SULFUR, 0.123);
        assertEquals(0.116, t.summary().mean(), 1e-15);
        assertEquals(0.0032, t.summary().sd(), 0.00005);
        assertEquals(4.43, Math.abs(t.t()), 0.005);
        assertEquals(3, t.degreesOfFreedom());
    }

    // Source: R 4.2.2 t.test(c(0.112, 0.118, 0.115, 0.119), mu = 0.123): t = -4.42718872424,
    // p = 0.0214072505969, 95 % interval 0.110968110572 to 0.121031889428; and Commons Math TTest.
    @Test
    void agreesWithRAndCommonsMath() {
        OneSampleTTest t = OneSampleTTest.of(SULFUR, 0.123);
        assertEquals(-4.42718872424, t.t(), 1e-10);
        assertEquals(0.0214072505969, t.p(), 1e-12);
        Interval ci = t.meanInterval(0.95);
        assertEquals(0.110968110572, ci.low(), 1e-12);
        assertEquals(0.121031889428, ci.high(), 1e-12);
        assertEquals(new TTest().tTest(0.123, SULFUR), t.p(), 1e-10);
    }

    // Source: the definition: the mean exactly on target gives t = 0, p = 1.
    @Test
    void meanOnTargetIsNoEvidence() {
        OneSampleTTest t = OneSampleTTest.of(new double[] {99, 101, 100}, 100);
        assertEquals(0, t.t(), 1e-13);
        assertEquals(1, t.p(), 1e-12);
    }

    @Test
    void equalResultsGiveNoTest() {
        UnusableDataException e = assertThrows(UnusableDataException.class,
                () -> OneSampleTTest.of(new double[] {100, 100, 100}, 98));
        assertEquals(UnusableDataException.Reason.NO_VARIATION, e.reason());
        assertThrows(UnusableDataException.class, () -> OneSampleTTest.of(new double[] {100}, 98));
    }
}
