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
        assertEquals(List.of("meritbook", "Java runtime", "Operating system"),
                components.subList(0, 3).stream().map(SoftwareComponent::name).toList(), "then the machine");
        for (SoftwareComponent c : components.subList(3, components.size())) {
            assertTrue(c.version().matches("\\d+\\.\\d+(\\.\\d+)?.*"), c.name() + " reports '" + c.version() + "'");
        }
        assertTrue(components.stream().anyMatch(c -> c.name().equals("Apache Commons Math") && c.version().equals("3.6.1")),
                "the pom pins Commons Math 3.6.1");
    }
}
