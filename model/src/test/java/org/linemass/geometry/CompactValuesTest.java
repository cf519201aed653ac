package org.linemass.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The compact storage of provenances and arcs keeps the value semantics of the records they
 * replaced: the handle text comes back exactly as given, equality and hash codes follow the
 * components, and arcs keep already-normalised axis objects. DXF handles are upper-case
 * hexadecimal strings (DXF Reference, group code 5: "handle", a hexadecimal string); the other
 * texts below are invented to reach the fallback path.
 */
class CompactValuesTest {

    @Test
    void handleText_comesBackExactlyAsGiven() {
        for (String h : new String[] {"", "0", "1F", "2B", "ABCDEF0123456789", "FFFFFFFFFFFFFFFF",
            "8000000000000000", "1f", "01F", "G1", " 1F", "12345678901234567", "handle-7"}) {
            Provenance p = Provenance.of("rack.dxf", "WIRE", 12, h, "LINE");
            assertEquals(h, p.handle(), "handle '" + h + "'");
            assertEquals(p, Provenance.of("rack.dxf", "WIRE", 12, h, "LINE"));
            assertEquals(p.hashCode(), Provenance.of("rack.dxf", "WIRE", 12, h, "LINE").hashCode());
        }
        assertEquals("", new Provenance("rack.dxf", "WIRE", 12, null, "LINE", List.of()).handle());
    }

    @Test
    void handleValue_equalsTheSameHandleGivenAsText() {
        // 0x2B = 43; -1 read as unsigned is sixteen F digits
        assertEquals(Provenance.of("a.dxf", "0", 5, "2B", "ARC"), Provenance.ofHandleValue("a.dxf", "0", 5, 43, "ARC"));
        assertEquals("FFFFFFFFFFFFFFFF", Provenance.ofHandleValue("a.dxf", "0", 5, -1, "ARC").handle());
        assertEquals(Provenance.of("a.dxf", "0", 5, "FFFFFFFFFFFFFFFF", "ARC"),
                Provenance.ofHandleValue("a.dxf", "0", 5, -1, "ARC"));
        // a non-canonical text with the same number is a different handle
        assertNotEquals(Provenance.of("a.dxf", "0", 5, "02B", "ARC"), Provenance.ofHandleValue("a.dxf", "0", 5, 43,
                "ARC"));
    }

    @Test
    void components_andDerivedProvenances() {
        Provenance p = new Provenance("f.dxf", "L1", 40, "A0", "CIRCLE", List.of("INNER"));
        assertEquals("f.dxf", p.file());
        assertEquals("L1", p.layer());
        assertEquals(40, p.line());
        assertEquals("CIRCLE", p.entityType());
        assertEquals(List.of("INNER"), p.blockPath());
        Provenance q = p.withLayer("L2").throughBlock("OUTER");
        assertEquals("L2", q.layer());
        assertEquals(List.of("OUTER", "INNER"), q.blockPath());
        assertEquals("A0", q.handle());
        assertEquals(new Provenance("f.dxf", "L2", 40, "A0", "CIRCLE", List.of("OUTER", "INNER")), q);
        assertNotEquals(p, q);
        assertEquals("CIRCLE at line 40, handle A0, via block INNER", p.describe());
    }

    @Test
    void arc_keepsNormalisedAxes_andComparesExactly() {
        Provenance src = Provenance.of("t.dxf", "0", 1, "1", "ARC");
        CircularArc a = CircularArc.of(Vec3.of(1, 2, 3), 2, Vec3.X, Vec3.Y, 0, 1, src);
        assertSame(Vec3.X, a.u());
        assertSame(Vec3.Y, a.v());
        CircularArc b = new CircularArc(Vec3.of(1, 2, 3), 2, Vec3.of(1, 0, 0), Vec3.of(0, 1, 0), 0, 1, src);
        assertEquals(a, b);
        assertEquals(a.hashCode(), b.hashCode());
        assertEquals(Vec3.of(1, 2, 3), a.centre());
        assertNotEquals(a, CircularArc.of(Vec3.of(1, 2, 3), 2, Vec3.X, Vec3.Y, 0, Math.nextUp(1.0), src));
        // not normalised: scaled to unit length (closed form: u = (3, 4, 0) / 5), v made orthogonal
        CircularArc c = CircularArc.of(Vec3.ZERO, 1, Vec3.of(3, 4, 0), Vec3.of(0, 2, 0), 0, 1, src);
        assertEquals(0.6, c.u().x(), 1e-15, "a few ulps of 0.6");
        assertEquals(0, c.u().dot(c.v()), 1e-15, "a few ulps of 1");
        assertEquals(1, c.v().norm(), 1e-15, "a few ulps of 1");
    }
}
