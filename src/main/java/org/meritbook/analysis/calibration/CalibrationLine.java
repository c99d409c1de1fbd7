package org.meritbook.analysis.calibration;

import java.util.Arrays;
import java.util.Objects;
import java.util.OptionalDouble;
import org.meritbook.analysis.Exported;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.stats.regression.LineFit;

/**
 * A straight-line calibration as later cells use it: the fit itself (for inverse prediction and
 * its standard error) and the quantities it reported (so their trail inputs link to the
 * calibration's own steps).
 *
 * @param cellId    the calibration cell's id
 * @param fit       the fitted line
 * @param xUnit     concentration unit, or null
 * @param yUnit     response unit, or null
 * @param xLow      lowest concentration in the fit
 * @param xHigh     highest concentration in the fit
 * @param internalStandard the header of the internal-standard column when the response is the ratio
 *                  A / A_IS (a cell reading back through this line must give its samples' ratio too), else null
 * @param lowestPlannedAboveZero the lowest concentration above zero among all the cell's standards, those
 *                  excluded from the fit included (NaN when none): the LLOQ the run was planned with
 */
public record CalibrationLine(String cellId, LineFit fit, String xUnit, String yUnit, double xLow, double xHigh,
                              String internalStandard, double lowestPlannedAboveZero) implements Exported {
    public CalibrationLine {
        Objects.requireNonNull(cellId, "cellId");
        Objects.requireNonNull(fit, "fit");
    }

    /** Whether the response is a ratio to an internal standard. */
    public boolean ratio() {
        return internalStandard != null;
    }

    /**
     * The lowest standard above zero in the fit: the line's lower end, or, when that is a zero
     * calibrator, the next one up. An LOQ is compared with it, never with a blank standard. Empty when
     * no standard lies above zero. ICH M10 calls it the LLOQ only when it is also the lowest standard
     * planned ({@link #lowestPlannedAboveZero}): a low QC does not become an LLOQ QC because the
     * run's lowest standard was excluded.
     */
    public OptionalDouble lowestStandardAboveZero() {
        return xLow > 0 ? OptionalDouble.of(xLow) : Arrays.stream(fit.x()).filter(x -> x > 0).min();
    }

    /** What a later cell's message calls the result it needs. */
    public static final String DESCRIPTION = "a straight-line calibration (model: linear or through-origin)";

    /** The calibration's reported quantity of this name (slope, intercept, residual_sd, …). */
    public static Quantity quantity(SectionResult calibration, String name) {
        return calibration.quantity(name).orElseThrow(() -> new IllegalStateException(
                "calibration " + calibration.id() + " reports no " + name));
    }
}
