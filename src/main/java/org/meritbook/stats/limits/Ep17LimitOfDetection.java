package org.meritbook.stats.limits;

import java.util.List;
import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.Moments;

/**
 * The limit of detection by the CLSI EP17 approach: the LoB plus a multiple of the SD of results
 * of low-level samples (EP17-A2, 2012, from memory).
 *
 * <p>Formulas, for J low-level samples with L results in all (nⱼ results and SD sⱼ for sample j):
 * <pre>
 *   SD_L = √( Σ (nⱼ − 1)·sⱼ² / (L − J) )          pooled within-sample SD
 *   c_p  = 1.645 / (1 − 1/(4·(L − J)))           1.645 with the small-sample correction of the SD
 *   LoD  = LoB + c_p·SD_L
 * </pre>
 * Preconditions: J ≥ 1 samples, each with at least 2 results, not all results of every sample
 * equal. The samples should lie near the expected LoD and share one SD; that is the caller's to
 * check.
 *
 * @param lob         the limit of blank used
 * @param sampleCount J
 * @param resultCount L
 * @param pooledSd    SD_L
 * @param cp          c_p
 * @param lod         LoB + c_p·SD_L
 */
public record Ep17LimitOfDetection(LimitOfBlank lob, int sampleCount, int resultCount, double pooledSd, double cp,
        double lod) {

    public Ep17LimitOfDetection {
        Objects.requireNonNull(lob, "lob");
        if (sampleCount < 1 || resultCount < 2 * sampleCount || !(pooledSd > 0) || Double.isInfinite(pooledSd)) {
            throw new IllegalArgumentException("an EP17 LoD needs J ≥ 1 samples of 2 or more results and SD_L > 0");
        }
        if (cp != multiplier(resultCount - sampleCount) || lod != lob.lob() + cp * pooledSd) {
            throw new IllegalArgumentException("the LoD must be LoB + c_p·SD_L with c_p = 1.645/(1 − 1/(4(L − J)))");
        }
    }

    /**
     * The LoD from a LoB and the results of low-level samples.
     *
     * @param lob             the limit of blank (parametric or non-parametric)
     * @param lowLevelSamples the results of each low-level sample
     * @throws UnusableDataException {@code TOO_FEW_VALUES}, {@code NOT_FINITE}, {@code NO_VARIATION}
     */
    public static Ep17LimitOfDetection of(LimitOfBlank lob, List<double[]> lowLevelSamples) {
        Objects.requireNonNull(lob, "lob");
        Objects.requireNonNull(lowLevelSamples, "lowLevelSamples");
        if (lowLevelSamples.isEmpty()) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "a limit of detection needs at least one low-level sample");
        }
        double pooled = 0;
        int results = 0;
        for (int j = 0; j < lowLevelSamples.size(); j++) {
            double[] v = SampleChecks.finiteCopy("low-level sample " + (j + 1), lowLevelSamples.get(j), 2);
            pooled += Moments.sumOfSquares(v, Moments.mean(v));
            results += v.length;
        }
        int df = results - lowLevelSamples.size();
        double sd = Math.sqrt(pooled / df);
        if (!(sd > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the results of every low-level sample are equal, so SD_L = 0 gives no limit");
        }
        double cp = multiplier(df);
        return new Ep17LimitOfDetection(lob, lowLevelSamples.size(), results, sd, cp, lob.lob() + cp * sd);
    }

    private static double multiplier(int df) {
        return LimitOfBlank.Z_95 / (1 - 1.0 / (4.0 * df));
    }
}
