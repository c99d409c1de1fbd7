package org.meritbook.analysis.detection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.SectionResult;
import org.meritbook.pipeline.StudyRunner;

/**
 * The demo notebook's three detection-limit cells against R 4.x: script
 * src/test/resources/detection/demo-reference.R for limits-solution (lm with weights (1/x)/mean(1/x),
 * uniroot), src/test/resources/detection/reference.R for mdl and lob-lod (qt, sd, shapiro.test).
 * The data are the demo workbook's invented blocks.
 */
class DemoLimitsTest {
    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError(s.id() + " has no " + name)).value();
    }

    @Test
    void everyMethodOfTheDemoAgreesWithR() {
        Map<String, SectionResult> sections = StudyRunner.withBuiltInAnalyses()
                .run(Path.of("demo-data/hmf-honey-validation.md")).sections().stream()
                .collect(Collectors.toMap(SectionResult::id, Function.identity()));
        SectionResult solution = sections.get("limits-solution");
        // R (src/test/resources/detection/demo-reference.R): blank LOD 0.00666518620768675, LOQ 0.0233289309768095 mg/L
        // (through the 1/y² line that weighting: auto keeps, a = 0.395794, b = 41.5474).
        assertEquals(0.00666518620768675, q(solution, "lod:blank"), 1e-12);
        assertEquals(0.0233289309768095, q(solution, "loq:blank"), 1e-12);
        assertEquals(q(solution, "lod:blank"), q(solution, "lod"), 0);
        // ICH Q2(R2) with σ = s(y/x) = 0.177762 of the weighted fit: 0.0141191265044895, 0.0427852318317863.
        assertEquals(0.0141191265044895, q(solution, "lod:response-sd"), 1e-12);
        assertEquals(0.0427852318317863, q(solution, "loq:response-sd"), 1e-12);
        // ISO 11843-2 / Hubaux–Vos, weighted, a blank weighted at the predicted response a: 0.00202926997604416, 0.00405846745940019.
        assertEquals(0.00202926997604416, q(solution, "critical_value:prediction-band"), 1e-10);
        assertEquals(0.00405846745940019, q(solution, "lod:prediction-band"), 1e-9);
        // S/N of S1: 30.8291873963516; LOD 0.00973103819257666, LOQ 0.0324367939752555 mg/L.
        assertEquals(0.00973103819257666, q(solution, "lod:signal-noise"), 1e-14);
        assertEquals(0.0324367939752555, q(solution, "loq:signal-noise"), 1e-14);
        assertTrue(solution.warnings().stream().anyMatch(w -> w.contains("not the SD of a low-level response")));
        // 40 CFR 136 App. B Rev. 2: MDL = max(MDL_s 0.0427292618627457, MDL_b 0.0688909958479025) mg/kg.
        assertEquals(0.0688909958479025, q(sections.get("mdl"), "lod"), 1e-13);
        assertEquals("mg/kg", sections.get("mdl").quantity("lod").orElseThrow().unit());
        // CLSI EP17-A2: parametric LoB 0.0372682484165049 (Shapiro–Wilk p = 0.480), LoD 0.0713930234767171 mg/kg.
        assertEquals(0.0372682484165049, q(sections.get("lob-lod"), "critical_value:lob-lod"), 1e-13);
        assertEquals(0.0713930234767171, q(sections.get("lob-lod"), "lod"), 1e-13);
    }
}
