package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** Entity geometry against closed forms and FACTS.md check values, on hand-written fragments. */
class EntityGeometryTest {

    /** Closed-form values computed in double precision: a few ulps of the coordinates. */
    private static final double CLOSE = 1e-12;
    /** FACTS.md tables print 8 to 12 significant digits; compare to their last printed digit. */
    private static final double TABLE_8 = 5e-9;
    private static final double TABLE_11 = 5e-11;

    private static List<Segment> model(Drawing d) {
        return d.modelSpace().segments();
    }

    private static void near(Vec3 expected, Vec3 got, double tol) {
        assertTrue(expected.closeTo(got, tol), () -> "expected " + expected + " got " + got);
    }

    @Test
    void arcWithExtrusionMinusZ_isMirrored() throws Exception {
        // FACTS.md §7.4 mirror test: centre (-5,0,0), start (-6,0,0), end (-5,1,0), clockwise from +Z
        Drawing d = DxfImporter.read(SharedFiles.testdata().resolve("ocs_mirror_arc.dxf"), ImportOptions.DEFAULTS);
        CircularArc a = (CircularArc) model(d).get(0);
        near(Vec3.of(-5, 0, 0), a.centre(), CLOSE);
        near(Vec3.of(-6, 0, 0), a.start(), CLOSE);
        near(Vec3.of(-5, 1, 0), a.end(), CLOSE);
        assertTrue(a.normal().z() < 0, "clockwise seen from +Z");
        // closed form: pi/2 either way
        assertEquals(Math.PI / 2, a.length(), CLOSE);
        assertEquals("A1", a.source().handle());
        assertEquals("ARC", a.source().entityType());
    }

    @Test
    void tiltedExtrusion_followsTheArbitraryAxisTable() throws Exception {
        double k = 1 / Math.sqrt(3);
        Drawing d = Dxf.create().entities()
                .add(0, "CIRCLE", 8, "T", 10, 0, 20, 0, 30, 2, 40, 1, 210, k, 220, k, 230, k).end().read();
        CircularArc c = (CircularArc) model(d).get(0);
        // FACTS.md §7.4 table, N = (1,1,1)/sqrt3: Ax = (-0.70710678, 0.70710678, 0), Ay = (-0.40824829, -0.40824829, 0.81649658)
        near(Vec3.of(-0.70710678, 0.70710678, 0), c.u(), TABLE_8);
        near(Vec3.of(-0.40824829, -0.40824829, 0.81649658), c.v(), TABLE_8);
        // elevation 2 along N
        near(Vec3.of(2 * k, 2 * k, 2 * k), c.centre(), CLOSE);
        assertEquals(2 * Math.PI, c.length(), CLOSE);
    }

    @Test
    void otherAxisTableRows() throws Exception {
        // FACTS.md §7.4: N=(0,1,0): Ax=(-1,0,0), Ay=(0,0,1); N=(1,0,0): Ax=(0,1,0), Ay=(0,0,1)
        Drawing d = Dxf.create().entities()
                .add(0, "CIRCLE", 40, 1, 210, 0, 220, 1, 230, 0)
                .add(0, "CIRCLE", 40, 1, 210, 1, 220, 0, 230, 0).end().read();
        CircularArc a = (CircularArc) model(d).get(0);
        near(Vec3.of(-1, 0, 0), a.u(), CLOSE);
        near(Vec3.of(0, 0, 1), a.v(), CLOSE);
        CircularArc b = (CircularArc) model(d).get(1);
        near(Vec3.of(0, 1, 0), b.u(), CLOSE);
        near(Vec3.of(0, 0, 1), b.v(), CLOSE);
    }

    @Test
    void arcThroughZeroDegrees_wraps() throws Exception {
        // FACTS.md §7.7: end < start -> sweep = end - start + 360 = 60 degrees
        CircularArc a = (CircularArc) model(Dxf.create().entities()
                .add(0, "ARC", 10, 0, 20, 0, 40, 10, 50, 330, 51, 30).end().read()).get(0);
        assertEquals(10 * Math.toRadians(60), a.length(), CLOSE);
        near(Vec3.of(10 * Math.cos(Math.toRadians(-30)), -5, 0), a.start(), CLOSE);
        near(Vec3.of(10 * Math.cos(Math.toRadians(30)), 5, 0), a.end(), CLOSE);
    }

    @Test
    void bulgeTable_bothDirections() throws Exception {
        // FACTS.md §7.5 table: centre, arc mid-point and length for four bulges
        Drawing d = DxfImporter.read(SharedFiles.testdata().resolve("bulge_table_lwpolyline.dxf"),
                ImportOptions.DEFAULTS);
        List<Segment> s = model(d);
        assertEquals(4, s.size());
        double[][] expected = {
            {1, 0, 1, -1, 3.14159265359},
            {0.5, 0.5, 0.5, -0.207106781187, 1.11072073454},
            {0.5, -0.5, 0.5, 0.207106781187, 1.11072073454},
            {5, 9.375, 5, -1.25, 10.4115931829}};
        for (int i = 0; i < 4; i++) {
            CircularArc a = (CircularArc) s.get(i);
            double[] e = expected[i];
            near(Vec3.of(e[0], e[1], 0), a.centre(), TABLE_11 * 10);
            near(Vec3.of(e[2], e[3], 0), a.point(0.5 * (a.t0() + a.t1())), TABLE_11 * 10);
            assertEquals(e[4], a.length(), TABLE_11 * 10, "length " + i);
            near(Vec3.ZERO, a.start(), CLOSE * 10);
        }
        assertTrue(((CircularArc) s.get(1)).normal().z() > 0, "positive bulge runs counter-clockwise");
        assertTrue(((CircularArc) s.get(2)).normal().z() < 0, "negative bulge runs clockwise");
    }

    @Test
    void lwpolylineClosedWithElevationAndMirror() throws Exception {
        // a 100 x 50 rectangle whose closing edge is a semicircle (bulge 1), elevation 7, extrusion (0,0,-1)
        Drawing d = Dxf.create().entities().add(0, "LWPOLYLINE", 8, "LOOP", 90, 4, 70, 1, 38, 7,
                10, 0, 20, 0, 10, 100, 20, 0, 10, 100, 20, 50, 10, 0, 20, 50, 42, 1, 210, 0, 220, 0, 230, -1).end().read();
        List<Segment> s = model(d);
        assertEquals(4, s.size());
        double total = 0;
        for (Segment x : s) {
            total += x instanceof Straight st ? st.length() : ((CircularArc) x).length();
        }
        // closed form: 100 + 50 + 100 + pi * 25
        assertEquals(250 + 25 * Math.PI, total, CLOSE * 1000);
        // OCS (x, y, 7) with N = (0,0,-1) is world (-x, y, -7) (FACTS.md §7.4)
        near(Vec3.of(-100, 0, -7), ((Straight) s.get(0)).b(), CLOSE);
        CircularArc closing = (CircularArc) s.get(3);
        near(Vec3.of(0, 25, -7), closing.centre(), CLOSE * 100);
        // OCS arc bulges to negative x (right of (0,50)->(0,0)); mirrored it bulges to world +x
        near(Vec3.of(25, 25, -7), closing.point(0.5 * (closing.t0() + closing.t1())), CLOSE * 100);
    }

    @Test
    void nestedMirroredInsertsWithArray() throws Exception {
        Drawing d = DxfImporter.read(SharedFiles.testdata().resolve("nested_mirrored_array.dxf"),
                ImportOptions.DEFAULTS);
        Insert panel = d.modelSpace().inserts().get(0);
        assertEquals(3, panel.columns());
        assertEquals(2, panel.rows());
        // rotation 90 degrees: column spacing 400 along world +y, row spacing 250 along world -x (not scaled)
        near(Vec3.of(0, 400, 0), panel.columnStep(), CLOSE);
        near(Vec3.of(-250, 0, 0), panel.rowStep(), CLOSE);
        List<TestExpander.Placed> placed = TestExpander.expand(d);
        assertEquals(12, placed.size());
        for (TestExpander.Placed p : placed) {
            assertEquals("PANEL", p.layer(), "layer 0 inside blocks takes the outer insert's layer");
            CircularArc a = assertInstanceOf(CircularArc.class, p.segment());
            // closed form: r * theta = 20 * pi / 2
            assertEquals(10 * Math.PI, a.length(), CLOSE * 100);
        }
        // copy (i=2, j=1): offset (-250, 800); plain hoop centre (1000, 600), mirrored hoop centre (1000, 400)
        Vec3 off = Vec3.of(-250, 800, 0);
        boolean plain = false;
        boolean mirrored = false;
        for (TestExpander.Placed p : placed) {
            CircularArc a = (CircularArc) p.segment();
            if (a.centre().closeTo(Vec3.of(1000, 600, 0).plus(off), 1e-9)) {
                plain = true;
                near(Vec3.of(1000, 620, 0).plus(off), a.start(), 1e-9);
                near(Vec3.of(980, 600, 0).plus(off), a.end(), 1e-9);
                assertTrue(a.normal().z() > 0);
            }
            if (a.centre().closeTo(Vec3.of(1000, 400, 0).plus(off), 1e-9)) {
                mirrored = true;
                near(Vec3.of(1000, 380, 0).plus(off), a.start(), 1e-9);
                near(Vec3.of(980, 400, 0).plus(off), a.end(), 1e-9);
                assertTrue(a.normal().z() < 0, "x scale -1 reverses the arc direction");
            }
        }
        assertTrue(plain && mirrored);
    }

    @Test
    void nonUniformInsertScale_turnsArcIntoEllipse() throws Exception {
        Drawing d = Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "RING", 10, 0, 20, 0, 30, 0,
                0, "CIRCLE", 8, "0", 10, 0, 20, 0, 30, 0, 40, 1, 0, "ENDBLK", 0, "ENDSEC").entities()
                .add(0, "INSERT", 8, "R", 2, "RING", 41, 2, 42, 1, 43, 1).end().read();
        Segment s = TestExpander.expand(d).get(0).segment();
        EllipticalArc e = assertInstanceOf(EllipticalArc.class, s);
        // FACTS.md §5.3: a = 2, b = 1, perimeter 9.68844822055
        double len = LineIntegrals.of(List.of(e)).length;
        assertEquals(9.68844822055, len, TABLE_11 * 10);
    }

    @Test
    void ellipse_fullAndWrappedParameters() throws Exception {
        Drawing d = Dxf.create().entities()
                .add(0, "ELLIPSE", 10, 1, 20, 2, 30, 3, 11, 0, 21, 3, 31, 0, 40, 1.0 / 3, 41, 0, 42, 2 * Math.PI)
                .add(0, "ELLIPSE", 10, 0, 20, 0, 30, 0, 11, 2, 21, 0, 31, 0, 40, 0.5, 41, 7 * Math.PI / 4,
                        42, 0).end().read();
        EllipticalArc full = (EllipticalArc) model(d).get(0);
        // FACTS.md §5.3: a = 3, b = 1 perimeter 13.3648932206; minor axis = unit(N x M) * ratio * |M| = (-1, 0, 0)
        assertEquals(13.3648932206, LineIntegrals.of(List.of(full)).length, TABLE_11 * 10);
        near(Vec3.of(-1, 0, 0), full.v(), CLOSE);
        EllipticalArc part = (EllipticalArc) model(d).get(1);
        // end 0 < start 7pi/4: runs 7pi/4 -> 2pi, which is the arc t in [-pi/4, 0] of FACTS.md §5.3 row
        // "parameter 0 to pi/4" mirrored: a = 2, b = 1 gives 0.965663744222
        assertEquals(Math.PI / 4, part.t1() - part.t0(), CLOSE);
        assertEquals(0.965663744222, LineIntegrals.of(List.of(part)).length, TABLE_11 * 10);
    }

    @Test
    void rationalSplineQuarterCircle_isExact() throws Exception {
        double w = Math.sqrt(0.5);
        Drawing d = Dxf.create().entities().add(0, "SPLINE", 8, "S", 70, 4 + 8, 71, 2, 72, 6, 73, 3, 74, 0,
                40, 0, 40, 0, 40, 0, 40, 1, 40, 1, 40, 1,
                10, 5, 20, 0, 30, 0, 41, 1, 10, 5, 20, 5, 30, 0, 41, w, 10, 0, 20, 5, 30, 0, 41, 1).end().read();
        Nurbs n = (Nurbs) model(d).get(0);
        assertTrue(n.isRational());
        for (int i = 0; i <= 10; i++) {
            // closed form: every point of the exact rational quadratic arc lies at radius 5
            assertEquals(5, n.point(i / 10.0).norm(), CLOSE * 10);
        }
        // closed form: r * pi / 2
        assertEquals(2.5 * Math.PI, LineIntegrals.of(List.of(n)).length, 1e-10);
    }

    @Test
    void fitPointSpline_interpolatesWithUnitTangentsOrNaturalEnds() throws Exception {
        Dxf dxf = Dxf.create().entities().add(0, "SPLINE", 8, "F", 70, 8, 71, 3, 72, 0, 73, 0, 74, 4,
                12, 1, 22, 0, 32, 0, 13, 0, 23, 1, 33, 0,
                11, 0, 21, 0, 31, 0, 11, 10, 21, 2, 31, 0, 11, 20, 21, 8, 31, 1, 11, 24, 21, 20, 31, 1)
                .add(0, "SPLINE", 8, "N", 71, 3, 74, 3, 11, 0, 21, 0, 31, 0, 11, 5, 21, 5, 31, 0, 11, 10, 21, 0, 31, 0)
                .end();
        List<Segment> s = model(dxf.read());
        Nurbs t = (Nurbs) s.get(0);
        Vec3[] fit = {Vec3.of(0, 0, 0), Vec3.of(10, 2, 0), Vec3.of(20, 8, 1), Vec3.of(24, 20, 1)};
        double[] knots = t.knots();
        // knots at cumulative chord length: interior knots are the fit-point parameters
        double u = 0;
        for (int k = 0; k < fit.length; k++) {
            if (k > 0) {
                u += fit[k].distance(fit[k - 1]);
            }
            near(fit[k], t.point(u), 1e-9);
            assertEquals(u, knots[Math.min(k + 3, knots.length - 4)], 1e-12);
        }
        // derivative with respect to chord length = the unit tangent (corpus README convention)
        near(Vec3.of(1, 0, 0), t.derivative(t.tStart()), 1e-9);
        near(Vec3.of(0, 1, 0), t.derivative(t.tEnd()), 1e-9);
        Nurbs n = (Nurbs) s.get(1);
        near(Vec3.ZERO, n.secondDerivative(n.tStart()), 1e-9);
        near(Vec3.ZERO, n.secondDerivative(n.tEnd()), 1e-9);
        near(Vec3.of(5, 5, 0), n.point(Math.sqrt(50)), 1e-9);
        // symmetric data: a natural cubic through symmetric points is symmetric about x = 5
        Vec3 a = n.point(2);
        Vec3 b = n.point(2 * Math.sqrt(50) - 2);
        assertEquals(10 - a.x(), b.x(), 1e-9);
        assertEquals(a.y(), b.y(), 1e-9);
    }

    @Test
    void helix_usesItsSplineDataNotTheHelixFields() throws Exception {
        Drawing d = Dxf.create().entities().add(0, "HELIX", 8, "H", 100, "AcDbSpline", 70, 0, 71, 1, 72, 4, 73, 2,
                74, 0, 40, 0, 40, 0, 40, 1, 40, 1, 10, 0, 20, 0, 30, 0, 10, 3, 20, 4, 30, 0,
                100, "AcDbHelix", 90, 29, 91, 63, 10, 9, 20, 9, 30, 9, 11, 1, 21, 0, 31, 0, 12, 0, 22, 0, 32, 1,
                40, 1, 41, 3, 42, 2, 290, 1, 280, 1).end().read();
        Nurbs n = (Nurbs) model(d).get(0);
        assertEquals(2, n.controlPoints().length);
        // closed form: straight degree-1 spline from (0,0,0) to (3,4,0): length 5
        assertEquals(5, LineIntegrals.of(List.of(n)).length, 1e-12);
        assertEquals(Map.of("HELIX", 1), d.modelSpace().curveEntityCounts());
    }

    @Test
    void polylines_2dBulged3dSplineFitAndMesh() throws Exception {
        Drawing d = Dxf.create().entities()
                // 2D with a bulge-1 semicircle at elevation 5
                .add(0, "POLYLINE", 5, "P1", 8, "A", 66, 1, 10, 0, 20, 0, 30, 5, 70, 0)
                .add(0, "VERTEX", 8, "A", 10, 0, 20, 0, 30, 5, 42, 1, 0, "VERTEX", 8, "A", 10, 2, 20, 0, 30, 5)
                .add(0, "SEQEND", 8, "A")
                // 3D closed triangle 3-4-5
                .add(0, "POLYLINE", 8, "B", 66, 1, 70, 9)
                .add(0, "VERTEX", 10, 0, 20, 0, 30, 0, 70, 32, 0, "VERTEX", 10, 3, 20, 0, 30, 0, 70, 32,
                        0, "VERTEX", 10, 3, 20, 4, 30, 0, 70, 32, 0, "SEQEND")
                // spline-fit: the frame vertex (flag 16) is not used, the fitted ones (flag 8) are
                .add(0, "POLYLINE", 8, "C", 66, 1, 70, 4)
                .add(0, "VERTEX", 10, 0, 20, 0, 70, 8, 0, "VERTEX", 10, 50, 20, 50, 70, 16,
                        0, "VERTEX", 10, 1, 20, 0, 70, 8, 0, "VERTEX", 10, 2, 20, 0, 70, 8, 0, "SEQEND")
                // polyface mesh: ignored with a note
                .add(0, "POLYLINE", 5, "PF", 8, "D", 66, 1, 70, 64, 71, 3, 72, 1)
                .add(0, "VERTEX", 10, 0, 20, 0, 30, 0, 70, 192, 0, "VERTEX", 70, 128, 71, 1, 72, 2, 73, 3, 0, "SEQEND")
                .add(0, "LINE", 8, "E", 11, 1)
                .end().read();
        List<Segment> s = model(d);
        CircularArc semi = (CircularArc) s.get(0);
        // FACTS.md §7.5 row 1: centre (1,0), length pi; here at elevation 5
        near(Vec3.of(1, 0, 5), semi.centre(), CLOSE);
        assertEquals(Math.PI, semi.length(), CLOSE);
        double tri = 0;
        for (int i = 1; i <= 3; i++) {
            tri += ((Straight) s.get(i)).length();
        }
        // closed form: 3 + 4 + 5
        assertEquals(12, tri, CLOSE);
        assertEquals(Vec3.of(1, 0, 0), ((Straight) s.get(4)).b());
        assertEquals(Vec3.of(2, 0, 0), ((Straight) s.get(5)).b());
        assertEquals("LINE", s.get(6).source().entityType(), "the entity after the mesh is read normally");
        assertEquals(Map.of("POLYLINE2D", 2, "POLYLINE3D", 1, "LINE", 1), d.modelSpace().curveEntityCounts());
        assertEquals(Map.of("POLYFACE_MESH", 1), d.modelSpace().otherEntityCounts());
        // the mesh is listed as not weighed on its layer D, which carries no wire: an info note
        var mesh = d.notes().stream().filter(n -> n.kind().equals("not_weighed")).toList();
        assertEquals(1, mesh.size());
        assertEquals("info", mesh.get(0).severity());
        assertEquals("layer 'D' holds 1 POLYFACE_MESH that cannot be weighed and no wire; nothing on it was counted",
                mesh.get(0).message());
    }

    @Test
    void paperSpaceAndOtherEntities_areCountedNotUsed() throws Exception {
        Drawing d = paperSpaceDrawing().read();
        assertEquals(1, d.modelSpace().segments().size());
        assertEquals(2, d.paperSpaceEntities());
        Map<String, Integer> other = d.modelSpace().otherEntityCounts();
        assertEquals(Map.of("TEXT", 2, "MTEXT", 1, "HATCH", 1, "DIMENSION", 1, "VIEWPORT", 1, "3DFACE", 1,
                "SOLID", 1, "POINT", 1, "ATTRIB", 2), other);
        assertTrue(d.notes().stream().anyMatch(n -> n.message().equals("block 'TAG' is not defined")), d.notes()
                .toString());
        ImportNote left = d.notes().stream().filter(n -> n.message().contains("paper space")).findFirst().orElseThrow();
        assertEquals("info", left.severity());
        assertEquals("2 entities in paper space were not read (only model space counts; --paper-space reads them "
                + "too)", left.message());
    }

    @Test
    void paperSpaceOption_readsLayoutEntitiesIntoModelSpace() throws Exception {
        Dxf dxf = paperSpaceDrawing();
        Drawing d = DxfImporter.read(Dxf.NAME, dxf.ascii(), ImportOptions.DEFAULTS.withPaperSpace(true));
        assertEquals(0, d.paperSpaceEntities());
        List<Segment> model = d.modelSpace().segments();
        assertEquals(3, model.size());
        // closed form: straights from the origin to (5,0,0) (block *Paper_Space) and (9,0,0) (67 = 1)
        Set<Double> ends = new HashSet<>();
        for (Segment s : model) {
            if (s.source().blockPath().equals(List.of("*Paper_Space"))) {
                ends.add(((Straight) s).b().x());
            } else {
                assertEquals(List.of(), s.source().blockPath());
                assertEquals(1.0, ((Straight) s).b().x());
            }
        }
        assertEquals(Set.of(5.0, 9.0), ends);
        ImportNote read = d.notes().stream().filter(n -> n.kind().equals("paper_space_read")).findFirst()
                .orElseThrow();
        assertEquals("warning", read.severity());
        assertTrue(read.message().startsWith("2 paper-space entities were read into model space"), read.message());
    }

    /** One LINE in the *Paper_Space block, one with 67 = 1 in ENTITIES, one in model space, and others. */
    private static Dxf paperSpaceDrawing() {
        return Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "*Paper_Space", 10, 0, 20, 0, 30, 0,
                0, "LINE", 11, 5, 0, "ENDBLK", 0, "BLOCK", 2, "*Model_Space", 0, "ENDBLK", 0, "ENDSEC").entities()
                .add(0, "LINE", 67, 1, 11, 9)
                .add(0, "INSERT", 66, 1, 2, "TAG", 0, "ATTRIB", 1, "A", 0, "ATTRIB", 1, "B", 0, "SEQEND")
                .add(0, "LINE", 11, 1)
                .add(0, "TEXT", 1, "shelf", 0, "MTEXT", 1, "x", 0, "HATCH", 0, "DIMENSION", 0, "TEXT", 1, "y",
                        0, "VIEWPORT", 0, "3DFACE", 0, "SOLID", 0, "POINT")
                .end();
    }

    @Test
    void arcWithEqualAngles_isAZeroLengthPiece_andZeroTo360IsFull() throws Exception {
        List<Segment> s = model(Dxf.create().entities().add(0, "ARC", 10, 1, 20, 0, 40, 2, 50, 90, 51, 90)
                .add(0, "ARC", 10, 1, 20, 0, 40, 2, 50, 0, 51, 360).end().read());
        Straight z = (Straight) s.get(0);
        near(Vec3.of(1, 2, 0), z.a(), CLOSE);
        assertEquals(z.a(), z.b());
        // closed form: 2 pi r
        assertEquals(4 * Math.PI, ((CircularArc) s.get(1)).length(), CLOSE);
    }

    @Test
    void zeroLengthLine_isKept() throws Exception {
        Straight s = (Straight) model(Dxf.create().entities().add(0, "LINE", 10, 4, 20, 4, 11, 4, 21, 4).end()
                .read()).get(0);
        assertEquals(s.a(), s.b());
    }

    @Test
    void insertPlacement_baseScaleRotationOcsOrder() throws Exception {
        // block point p -> (p - base) * scale -> rotate 30 deg -> + insertion -> OCS (0,0,-1) (FACTS.md §7.2)
        Drawing d = Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "B", 10, 1, 20, 1, 30, 0,
                0, "LINE", 10, 1, 20, 1, 11, 3, 21, 1, 0, "ENDBLK", 0, "ENDSEC").entities()
                .add(0, "INSERT", 2, "B", 10, 10, 20, 0, 30, 2, 41, 3, 42, 1, 43, 1, 50, 30, 210, 0, 220, 0, 230, -1)
                .end().read();
        Straight s = (Straight) TestExpander.expand(d).get(0).segment();
        double c = Math.cos(Math.toRadians(30));
        double sn = Math.sin(Math.toRadians(30));
        // (3,1)-(1,1) = (2,0) -> scaled (6,0) -> rotated (6c, 6s) -> + (10,0,2) -> mirror x: (-(10+6c), 6s, -2)
        near(Vec3.of(-10, 0, -2), s.a(), CLOSE * 100);
        near(Vec3.of(-(10 + 6 * c), 6 * sn, -2), s.b(), CLOSE * 100);
    }
}
