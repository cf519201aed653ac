package org.linemass.engine.resolve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.linemass.engine.result.EntityCounts;
import org.linemass.engine.testing.Drawings;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class EntityCounterTest {

    @Test
    void countsMultiplyThroughArraysAndNesting() {
        // PANEL: 2 lines + 1 text; ROW: 3 panels + 1 arc; model: a 3 x 4 array of ROW, one PANEL, 2 texts
        Drawings d = Drawings.create();
        d.block("PANEL").line("0", Vec3.ZERO, Vec3.X).line("0", Vec3.X, Vec3.Y).text(1);
        d.block("ROW").insert("PANEL", "0", Affine.IDENTITY).insert("PANEL", "0", Affine.IDENTITY)
                .insert("PANEL", "0", Affine.IDENTITY).arc("0", Vec3.ZERO, 1, 0, 1);
        d.model().array("ROW", "A", Affine.IDENTITY, 3, 4, Vec3.X, Vec3.Y).insert("PANEL", "B", Affine.IDENTITY)
                .text(2);
        EntityCounts c = EntityCounter.count(d.build());
        assertEquals(12L * 3 * 2 + 2, c.curves().get("LINE"));
        assertEquals(12L, c.curves().get("ARC"));
        assertEquals(12L * 3 + 1 + 2, c.noGeometry().get("TEXT"));
    }

    @Test
    void countsSaturateInsteadOfOverflowing() {
        // 40 levels of a 32767 x 32767 array: far beyond Long.MAX_VALUE copies
        Drawings d = Drawings.create();
        d.block("L0").line("0", Vec3.ZERO, Vec3.X);
        for (int i = 1; i <= 40; i++) {
            d.block("L" + i).array("L" + (i - 1), "0", Affine.IDENTITY, 32767, 32767, Vec3.X, Vec3.Y);
        }
        d.model().insert("L40", "W", Affine.IDENTITY);
        assertEquals(Long.MAX_VALUE, EntityCounter.count(d.build()).curves().get("LINE"));
        assertEquals(Long.MAX_VALUE, Saturating.multiply(Long.MAX_VALUE / 2, 3));
        assertEquals(Long.MAX_VALUE, Saturating.add(Long.MAX_VALUE - 1, 5));
        assertEquals(6, Saturating.multiply(2, 3));
    }
}
