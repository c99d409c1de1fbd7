package org.meritbook.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AcceptanceBands;
import org.meritbook.study.AnalysisKind;

/** The bands a figure draws are the limits of the rules that judge its section, and only those. */
class ProfileBandsTest {
    private static final AcceptanceProfile PROFILE = new AcceptanceProfile("lab", "test limits", "lab.yaml", List.of(
            new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", true, 80, "R", null, "SOP"),
            new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", true, 90, "R", null, "SOP"),
            new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", false, 110, "R", null, "SOP"),
            new QuantityRule(AnalysisKind.ACCURACY, "Recovery at L1", "recovery_percent:L1", false, 105, "R", null, "SOP"),
            new QuantityRule(AnalysisKind.CALIBRATION, "Linearity", "r_squared", true, 0.99, "r²", "quadratic", "SOP"),
            new DeviationRule("Back-calculated standards", 10, 15, 1.0, "SOP"),
            new DeviationRule("Back-calculated standards", 12, 12, 0.5, "SOP")));

    @Test
    void theTightestLimitOfTheRulesOnTheWholeFamilyCounts() {
        AcceptanceBands bands = ProfileBands.of(PROFILE);
        // ≥ 80 and ≥ 90 both apply: 90; the member rule on L1 is not a band for every level.
        assertEquals(new AcceptanceBands.Band(90, 110, "lab"), bands.on(AnalysisKind.ACCURACY, null, "recovery_percent"));
        assertTrue(bands.on(AnalysisKind.PRECISION, null, "recovery_percent").isEmpty());
        assertEquals(Optional.of(new AcceptanceBands.DeviationBand(10, 12, "lab")), bands.deviation(AnalysisKind.CALIBRATION));
        assertEquals(Optional.empty(), bands.deviation(AnalysisKind.RANGE));
    }

    @Test
    void aRuleForOneModelBoundsOnlySectionsOfThatModel() {
        AcceptanceBands bands = ProfileBands.of(PROFILE);
        assertEquals(0.99, bands.on(AnalysisKind.CALIBRATION, "quadratic", "r_squared").low(), 0);
        assertTrue(bands.on(AnalysisKind.CALIBRATION, "linear", "r_squared").isEmpty());
        assertTrue(ProfileBands.of(null).on(AnalysisKind.ACCURACY, null, "recovery_percent").isEmpty());
    }
}
