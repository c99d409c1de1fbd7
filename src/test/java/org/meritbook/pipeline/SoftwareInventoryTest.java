package org.meritbook.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.meritbook.pipeline.StudyResults.SoftwareComponent;
import org.junit.jupiter.api.Test;

class SoftwareInventoryTest {
    @Test
    void everyLibraryReportsADottedVersion() {
        List<SoftwareComponent> components = SoftwareInventory.components();
        assertEquals("meritbook", components.get(0).name());
        for (SoftwareComponent c : components.subList(2, components.size())) {
            assertTrue(c.version().matches("\\d+\\.\\d+(\\.\\d+)?.*"), c.name() + " reports '" + c.version() + "'");
        }
        assertTrue(components.stream().anyMatch(c -> c.name().equals("Apache Commons Math") && c.version().equals("3.6.1")),
                "the pom pins Commons Math 3.6.1");
    }
}
