package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Invariants over seeded random inputs (plain JUnit loops with fixed seeds, so failures reproduce):
 * bulge arcs join their vertices with the sweep 4 atan|b|, in any OCS; the same pairs read as
 * plain, padded/CRLF and binary DXF give identical segments.
 */
class RandomisedPropertyTest {

    private static final int CASES = 300;
    /** Relative to the coordinates' size (up to 1000): centre-from-chord arithmetic loses a few digits. */
    private static final double REL = 1e-9;
    private static final Provenance NONE = Provenance.of("", "", 0, "", "");

    @Test
    void bulgeArcs_startAndEndAtTheirVertices() throws Exception {
        Random rnd = new Random(11);
        for (int c = 0; c < CASES; c++) {
            double x1 = 2000 * rnd.nextDouble() - 1000;
            double y1 = 2000 * rnd.nextDouble() - 1000;
            double x2 = 2000 * rnd.nextDouble() - 1000;
            double y2 = 2000 * rnd.nextDouble() - 1000;
            double b = (rnd.nextBoolean() ? 1 : -1) * (0.01 + 4 * rnd.nextDouble());
            double z = 100 * rnd.nextDouble();
            Vec3 n = new Vec3(rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian());
            Drawing d = Dxf.create().entities().add(0, "LWPOLYLINE", 90, 2, 38, z, 10, x1, 20, y1, 42, b, 10, x2,
                    20, y2, 210, n.x(), 220, n.y(), 230, n.z()).add(0, "LWPOLYLINE", 90, 2, 38, z, 10, x1, 20, y1,
                    10, x2, 20, y2, 210, n.x(), 220, n.y(), 230, n.z()).end().read();
            List<Segment> s = d.modelSpace().segments();
            CircularArc arc = (CircularArc) s.get(0);
            Segment chord = s.get(1);
            double tol = REL * 1000 * Math.max(1, Math.abs(b) + 1 / Math.abs(b));
            assertTrue(arc.start().closeTo(chord.start(), tol), () -> arc.start() + " vs " + chord.start());
            assertTrue(arc.end().closeTo(chord.end(), tol), () -> arc.end() + " vs " + chord.end());
            // FACTS.md §7.5: included angle 4 atan|b|
            assertEquals(4 * Math.atan(Math.abs(b)), arc.sweep(), 1e-12);
            // counter-clockwise about the extrusion for b > 0
            assertEquals(Math.signum(b), Math.signum(arc.normal().dot(n)));
        }
    }

    @Test
    void decimalText_parsesExactlyAsJavaDoes() throws Exception {
        Random rnd = new Random(99);
        for (int c = 0; c < 200; c++) {
            Dxf dxf = Dxf.create().entities();
            String[] texts = new String[60];
            for (int k = 0; k < texts.length; k++) {
                double v = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(12) - 3);
                String t = switch (rnd.nextInt(5)) {
                    case 0 -> String.format(Locale.ROOT, "%." + rnd.nextInt(10) + "f", v);
                    case 1 -> Double.toString(v);
                    case 2 -> String.format(Locale.ROOT, "%.12e", v);
                    case 3 -> Long.toString(rnd.nextLong() % 1_000_000_000_000_000L);
                    default -> String.format(Locale.ROOT, "%+.3f", v).replace("0.", ".");
                };
                texts[k] = t;
            }
            for (int k = 0; k < texts.length; k += 2) {
                dxf.add(0, "LINE", 10, texts[k], 11, texts[k + 1]);
            }
            List<Segment> s = dxf.end().read().modelSpace().segments();
            for (int k = 0; k < texts.length; k += 2) {
                org.linemass.geometry.Straight st = (org.linemass.geometry.Straight) s.get(k / 2);
                // reference: the JDK's correctly rounded decimal conversion
                assertEquals(Double.parseDouble(texts[k]), st.a().x(), 0.0, texts[k]);
                assertEquals(Double.parseDouble(texts[k + 1]), st.b().x(), 0.0, texts[k + 1]);
            }
        }
    }

    @Test
    void plainPaddedCrlfAndBinary_readTheSame() throws Exception {
        Random rnd = new Random(5);
        for (int c = 0; c < 50; c++) {
            Dxf dxf = Dxf.create().entities();
            for (int k = 0; k < 20; k++) {
                dxf.add(0, "LINE", 5, Integer.toHexString(100 + k).toUpperCase(Locale.ROOT), 8, "L" + rnd.nextInt(3),
                        10, rnd.nextGaussian() * 1e3, 20, rnd.nextGaussian(), 30, rnd.nextGaussian() * 1e-3,
                        11, rnd.nextDouble(), 21, -rnd.nextDouble() * 1e6, 31, rnd.nextInt(1000));
                dxf.add(0, "CIRCLE", 8, "C", 10, rnd.nextGaussian(), 20, rnd.nextGaussian(), 40, 0.1 + rnd.nextDouble());
            }
            dxf.end();
            StringBuilder padded = new StringBuilder();
            List<String> lines = dxf.lines();
            for (int i = 0; i < lines.size(); i += 2) {
                padded.append(String.format(Locale.ROOT, "%3s\r\n%s\r\n", lines.get(i), lines.get(i + 1)));
            }
            List<Segment> a = dxf.read().modelSpace().segments();
            List<Segment> p = DxfImporter.read("p.dxf", padded.toString().getBytes(java.nio.charset.StandardCharsets.US_ASCII),
                    ImportOptions.DEFAULTS).modelSpace().segments();
            List<Segment> b = DxfImporter.read("b.dxf", dxf.binary(true), ImportOptions.DEFAULTS).modelSpace().segments();
            assertEquals(a.size(), p.size());
            assertEquals(a.size(), b.size());
            for (int i = 0; i < a.size(); i++) {
                // Java's shortest decimal round-trips exactly, so all three are bit-identical
                assertEquals(a.get(i).withSource(NONE), p.get(i).withSource(NONE));
                assertEquals(a.get(i).withSource(NONE), b.get(i).withSource(NONE));
                assertEquals(a.get(i).source().layer(), b.get(i).source().layer());
            }
        }
    }
}
