package org.meritbook.qualification;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.QuadraticFit;
import org.meritbook.stats.regression.Weighting;

/**
 * The tool's own qualification: the calibration fits recompute NIST StRD certified values (the
 * files ship inside meritbook, unchanged) on the machine where it runs, and every figure must agree
 * on at least 9 significant digits. This is evidence for the laboratory's software validation,
 * not a substitute for it.
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
        return checks;
    }

    private static void add(List<QualificationCheck> checks, NistDataset d, String model, String figure,
                            double computed, double certified) {
        checks.add(new QualificationCheck(d.name(), model, figure, certified, computed,
                QualificationCheck.lre(computed, certified), REQUIRED_DIGITS));
    }
}
