package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PlanCautionTest {

    // About 120 m (400 ft) above ground without a permission: common practice of many aviation authorities (from memory).
    @Test
    void theCeilingCautionNamesThe120MetreLimitAndStoppingNearConvection() {
        String c = PlanOutputs.ceilingCaution(600);
        assertTrue(c.contains("about 120 m (400 ft) above ground"), c);
        assertTrue(c.contains("convection"), c);
        assertTrue(c.contains("reach 600 m, above that limit"), c);
    }

    @Test
    void aCeilingBelowTheLimitIsNotCalledAboveIt() {
        String c = PlanOutputs.ceilingCaution(100);
        assertTrue(c.contains("120 m"), c);
        assertFalse(c.contains("above that limit"), c);
    }
}
