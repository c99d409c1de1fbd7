package org.meritbook.analysis.detection;

import java.util.List;
import java.util.Locale;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.Moments;
import org.meritbook.trail.StepInput;

/**
 * {@code signal-noise}: from the signal of a low standard and the baseline noise beside it,
 * S/N = mean signal / mean noise, and the concentrations giving 3:1 and 10:1,
 * LOD = 3·c/(S/N), LOQ = 10·c/(S/N) (ICH Q2(R2), signal-to-noise approach, from memory). The signal
 * and noise are taken as supplied (some pharmacopoeias define S/N = 2H/h; supply 2H then).
 */
final class SignalNoiseMethod {
    static final String NAME = "signal-noise";
    static final String PROCEDURE = "ICH Q2(R2): signal-to-noise, 3:1 and 10:1";
    static final double DETECTION_RATIO = 3;
    static final double QUANTITATION_RATIO = 10;

    private SignalNoiseMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        SectionBuilder s = in.section();
        MeasuredSet signal = require(in, in.signal().orElse(null), "signal",
                "'signal: {data: …, column: <signal>, concentration: <column>}'");
        MeasuredSet noise = require(in, in.noise().orElse(null), "noise", "'noise: {data: …, column: <noise>}'");
        if (signal.values().length == 0 || noise.values().length == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "there is no usable " + (signal.values().length == 0 ? "signal" : "noise") + " value");
        }
        double[] c = signal.extraNumbers();
        for (int i = 1; i < c.length; i++) {
            if (c[i] != c[0]) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, in.context().where(signal.line()),
                        "one concentration for every signal (one standard)", c[0] + " and " + c[i]
                                + " in the concentration column of " + signal.where(),
                        "Give the signals of one standard only.");
            }
        }
        String cUnit = signal.rows().columns().get(1).unit();
        if (signal.unit() != null && noise.unit() != null && !signal.unit().equals(noise.unit())) {
            s.warning("Method signal-noise: the signal is in " + signal.unit() + " and the noise in " + noise.unit()
                    + "; their ratio assumes one unit.");
        }
        double h = Moments.mean(signal.values());
        double n = Moments.mean(noise.values());
        if (!(n > 0) || !(h > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, String.format(Locale.ROOT,
                    "the mean signal (%.4g) and mean noise (%.4g) must both be positive for a signal-to-noise ratio", h, n));
        }
        String hId = s.step("sn_signal", "Mean signal of the standard (" + signal.values().length + " values)",
                "H̄ = Σ H[i] / n", signal.inputs("H"), h, signal.unit(), null);
        String nId = s.step("sn_noise", "Mean noise (" + noise.values().length + " values)", "h̄ = Σ h[i] / n",
                noise.inputs("h"), n, noise.unit(), null);
        String ratio = s.step("sn_ratio", String.format(Locale.ROOT, "Signal-to-noise ratio at %.4g %s", c[0],
                cUnit == null ? "" : cUnit), "S/N = H̄ / h̄", List.of(s.ref("H̄", hId), s.ref("h̄", nId)), h / n, null,
                PROCEDURE);
        StepInput conc = StepInput.number("c", c[0], cUnit, signal.rows().used().get(0).cell(1).ref().address());
        double sn = h / n;
        s.quantity(QuantityDraft.of("lod:signal-noise", "LOD: the concentration giving S/N = 3",
                "LOD = 3·c / (S/N)", List.of(conc, s.ref("S/N", ratio)), DETECTION_RATIO * c[0] / sn, cUnit)
                .withMethod(PROCEDURE));
        s.quantity(QuantityDraft.of("loq:signal-noise", "LOQ: the concentration giving S/N = 10",
                "LOQ = 10·c / (S/N)", List.of(conc, s.ref("S/N", ratio)), QUANTITATION_RATIO * c[0] / sn, cUnit)
                .withMethod(PROCEDURE));
        in.mark("LOD, signal-noise", DETECTION_RATIO * c[0] / sn, cUnit, false);
        return new LimitRow(NAME, cUnit, String.format(Locale.ROOT, "S/N = %.4g at %.4g %s, scaled linearly", sn, c[0],
                cUnit == null ? "" : cUnit), PROCEDURE, true, false);
    }

    private static MeasuredSet require(DetectionInputs in, MeasuredSet set, String option, String expected) {
        if (set == null) {
            throw new InputException(ErrorKey.MISSING_OPTION, in.context().where(in.cell().lineOf("methods")),
                    expected + " for method signal-noise", "no " + option + ": option",
                    "Add the " + option + " values under '" + option + ":'.");
        }
        return set;
    }
}
