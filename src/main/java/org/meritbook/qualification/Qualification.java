package org.meritbook.qualification;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.stats.anova.OneWayAnova;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.QuadraticFit;
import org.meritbook.stats.regression.Weighting;

/**
 * The tool's own qualification: the calibration fits, the mean and SD, and the one-way ANOVA
 * recompute NIST StRD certified values (the files ship inside meritbook, unchanged) on the machine
 * where it runs, and every figure must agree on at least 9 significant digits. The univariate and
 * ANOVA data are centred exactly on their decimal text before conversion to doubles (see {@link
 * NistAnovaDataset}); the record says so. This is evidence for the laboratory's software
 * validation, not a substitute for it.
 */
public final class Qualification {
    /** Digits required on every certified figure (NIST suggests 9 or more for lower-difficulty sets). */
    public static final double REQUIRED_DIGITS = 9;

    private Qualification() {
    }

    public static List<QualificationCheck> run() {
        List<QualificationCheck> checks = new ArrayList<>();
        NistDataset norris = NistDataset.load("Norris");
        LineFit line = LeastSquares.fitLine(norris.x(), norris.y(), Weighting.NONE, LineModel.WITH_INTERCEPT);
        String straight = "y = B0 + B1·x";
        add(checks, norris, straight, "B0", line.intercept(), norris.estimate("B0"));
        add(checks, norris, straight, "B1", line.slope(), norris.estimate("B1"));
        add(checks, norris, straight, "sd(B0)", line.interceptSe(), norris.standardDeviation("B0"));
        add(checks, norris, straight, "sd(B1)", line.slopeSe(), norris.standardDeviation("B1"));
        add(checks, norris, straight, "residual SD", line.residualSd(), norris.residualSd());
        add(checks, norris, straight, "R²", line.rSquared(), norris.rSquared());
        for (String name : List.of("NoInt1", "NoInt2")) {
            NistDataset d = NistDataset.load(name);
            LineFit fit = LeastSquares.fitLine(d.x(), d.y(), Weighting.NONE, LineModel.THROUGH_ORIGIN);
            String origin = "y = B1·x";
            add(checks, d, origin, "B1", fit.slope(), d.estimate("B1"));
            add(checks, d, origin, "sd(B1)", fit.slopeSe(), d.standardDeviation("B1"));
            add(checks, d, origin, "residual SD", fit.residualSd(), d.residualSd());
            add(checks, d, origin, "R² (uncentred)", fit.rSquared(), d.rSquared());
        }
        NistDataset pontius = NistDataset.load("Pontius");
        QuadraticFit quad = LeastSquares.fitQuadratic(pontius.x(), pontius.y(), Weighting.NONE);
        String quadratic = "y = B0 + B1·x + B2·x²";
        add(checks, pontius, quadratic, "B0", quad.intercept(), pontius.estimate("B0"));
        add(checks, pontius, quadratic, "B1", quad.linear(), pontius.estimate("B1"));
        add(checks, pontius, quadratic, "B2", quad.quadratic(), pontius.estimate("B2"));
        add(checks, pontius, quadratic, "sd(B0)", quad.interceptSe(), pontius.standardDeviation("B0"));
        add(checks, pontius, quadratic, "sd(B1)", quad.linearSe(), pontius.standardDeviation("B1"));
        add(checks, pontius, quadratic, "sd(B2)", quad.quadraticSe(), pontius.standardDeviation("B2"));
        add(checks, pontius, quadratic, "residual SD", quad.residualSd(), pontius.residualSd());
        add(checks, pontius, quadratic, "R²", quad.rSquared(), pontius.rSquared());
        for (String name : NistUnivariateDataset.NAMES) {
            NistUnivariateDataset d = NistUnivariateDataset.load(name);
            SampleSummary s = SampleSummary.of(d.centredValues());
            String model = "mean and SD (n − 1)";
            add(checks, name, model, "mean", d.centre().doubleValue() + s.mean(), d.certifiedMean());
            add(checks, name, model, "SD", s.sd(), d.certifiedSd());
        }
        for (String name : NistAnovaDataset.NAMES) {
            NistAnovaDataset d = NistAnovaDataset.load(name);
            OneWayAnova a = OneWayAnova.of(d.centredGroups());
            String model = "one-way ANOVA, " + a.groupCount() + " groups";
            add(checks, name, model, "SS between", a.ssBetween(), d.ssBetween());
            add(checks, name, model, "SS within", a.ssWithin(), d.ssWithin());
            add(checks, name, model, "MS between", a.msBetween(), d.msBetween());
            add(checks, name, model, "MS within", a.msWithin(), d.msWithin());
            add(checks, name, model, "F", a.f(), d.f());
            add(checks, name, model, "R²", a.rSquared(), d.rSquared());
            add(checks, name, model, "residual SD", a.residualSd(), d.residualSd());
        }
        return checks;
    }

    private static void add(List<QualificationCheck> checks, NistDataset d, String model, String figure,
                            double computed, double certified) {
        add(checks, d.name(), model, figure, computed, certified);
    }

    private static void add(List<QualificationCheck> checks, String dataset, String model, String figure,
                            double computed, double certified) {
        checks.add(new QualificationCheck(dataset, model, figure, certified, computed,
                QualificationCheck.lre(computed, certified), REQUIRED_DIGITS));
    }
}
