package org.linemass.engine.assemble;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class MaterialPlanTest {

    @Test
    void mostSpecificDensityGlobWins() throws AnalysisException {
        AnalysisSettings base = AnalysisSettings.defaults(BuiltInSections.table())
                .withAssignments(List.of(AssignmentReader.parseArgument("CABLE*=AWG10-CU")));
        AnalysisSettings s = new AnalysisSettings(base.joinM(), base.gapLimitM(), base.groupM(),
                base.integrationRelative(), false, List.of(), List.of(), false, base.sections(), base.assignments(),
                Map.of("*", "1", "CABLE*", "2", "CABLE-A", "3", "CABLE-??", "4"), base.maxExpandedSegments());
        MaterialPlan plan = MaterialPlan.of(s);
        // exact name beats every glob; then the longest glob
        assertEquals(3, plan.forLayer("CABLE-A").field().orElseThrow().at(Vec3.ZERO, 0), 0);
        assertEquals(4, plan.forLayer("CABLE-AB").field().orElseThrow().at(Vec3.ZERO, 0), 0);
        assertEquals(2, plan.forLayer("CABLE-ABC").field().orElseThrow().at(Vec3.ZERO, 0), 0);
        assertEquals(1, plan.forLayer("FRAME").field().orElseThrow().at(Vec3.ZERO, 0), 0);
        // the section is decided independently of the density expression
        assertEquals("AWG10-CU", plan.forLayer("CABLE-A").section().orElseThrow().id());
        assertFalse(plan.forLayer("FRAME").section().isPresent());
        assertTrue(plan.forLayer("FRAME").hasMass());
    }
}
