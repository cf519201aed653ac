package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.geometry.Segment;

/**
 * MLINE element lines placed with the MLINESTYLE of the OBJECTS section (testdata/importer/
 * mline_styles.dxf, values derived by hand in its README row), and the same element lines as ezdxf
 * (an independent DXF library) regenerates them from the style.
 */
class MlineStyleTest {

    /** Sums of a few closed-form lengths of order 10 in double precision: a few ulps, with room. */
    private static final double EXACT = 1e-12;

    private static final Path FILE = SharedFiles.testdata().resolve("mline_styles.dxf");

    private static Drawing read() throws DxfInputException {
        return DxfImporter.read(FILE, ImportOptions.DEFAULTS.withMlinesAndLeaders(true));
    }

    /** Length of each element line (segments of one element follow each other, vertex count - 1 each). */
    private static List<Double> elementLengths(List<Segment> segs, int perElement) {
        double[] out = new double[segs.size() / perElement];
        for (int i = 0; i < segs.size(); i++) {
            out[i / perElement] += segs.get(i).start().distance(segs.get(i).end());
        }
        return java.util.Arrays.stream(out).boxed().toList();
    }

    @Test
    void read_elementsWithoutParameters_takeTheStyleOffsets() throws Exception {
        Map<String, List<Segment>> layers = ExternalDrawingsTest.visibleByLayer(read());
        // README: style offsets 1, 0, -0.5, top justification shift -1, scale 2: miter distances 0, -2, -3 at
        // right-angled ends and times sqrt 2 at the 45-degree corner miter; lines 10 + 10, 12 + 12, 13 + 13
        List<Double> fromStyle = elementLengths(layers.get("RAILS"), 2);
        assertEquals(3, fromStyle.size());
        assertEquals(20, fromStyle.get(0), EXACT * 20);
        assertEquals(24, fromStyle.get(1), EXACT * 24);
        assertEquals(26, fromStyle.get(2), EXACT * 26);
        // the same path written with the parameters a writer derives gives the same lines (style found by name)
        List<Double> given = elementLengths(layers.get("RAILS_GIVEN"), 2);
        for (int e = 0; e < 3; e++) {
            assertEquals(fromStyle.get(e), given.get(e), EXACT * 26);
        }
        // the outer element at the corner: (10, 0) moved by -3 sqrt 2 along (-1, 1)/sqrt 2 is (13, -3)
        Segment outer = layers.get("RAILS").get(4);
        assertEquals(13, outer.end().x(), EXACT * 13);
        assertEquals(-3, outer.end().y(), EXACT * 13);
    }

    @Test
    void read_countsThatDisagreeWithTheStyle_orAMissingStyle_skipTheMline() throws Exception {
        Drawing d = read();
        Map<String, String> errors = new TreeMap<>();
        for (ImportNote n : d.notes()) {
            if (n.severity().equals("error")) {
                errors.put(n.layer(), n.message());
            }
        }
        assertEquals(Map.of("BAD_COUNT", "declares 2 style elements but its style 'RAIL3' has 3",
                "NO_STYLE", "element 0 at vertex 0 has no parameters (74 = 0) and the MLINESTYLE 'NOSUCH' is not in"
                        + " the file"), errors);
        assertEquals(Map.of("MLINE", 2), d.modelSpace().curveEntityCounts());
    }

    @Test
    void read_matchesTheElementLinesEzdxfRegeneratesFromTheStyle() throws Exception {
        String py = python();
        Assumptions.assumeTrue(py != null, "no Python with ezdxf (apt-get install -y python3-ezdxf): check skipped");
        // ezdxf recomputes the miter parameters of MLINE 50 from its MLINESTYLE (update_geometry) and draws the
        // element lines (virtual_entities); one length per line, in element order within each segment
        String script = String.join("\n", "import sys", "from ezdxf import recover",
                "doc, _ = recover.readfile(sys.argv[1])", "m = doc.entitydb['50']", "m.update_geometry()",
                "for e in m.virtual_entities():", "    print(repr(e.dxf.start.distance(e.dxf.end)))");
        Process p = new ProcessBuilder(py, "-c", script, FILE.toString()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS) && p.exitValue() == 0, out);
        List<Double> theirs = out.lines().map(Double::parseDouble).toList();
        List<Segment> ours = ExternalDrawingsTest.visibleByLayer(read()).get("RAILS");
        assertEquals(6, theirs.size(), out);
        // ezdxf lists segment by segment (all elements of the first segment, then the second); ours element by
        // element: line k of element e is our segment 2 e + k
        for (int k = 0; k < 2; k++) {
            for (int e = 0; e < 3; e++) {
                Segment s = ours.get(2 * e + k);
                assertEquals(theirs.get(3 * k + e), s.start().distance(s.end()), EXACT * 13);
            }
        }
    }

    /** A Python interpreter that can import ezdxf (the Debian package installs into /usr/bin/python3), or null. */
    private static String python() {
        for (String py : new String[] {"/usr/bin/python3", "python3"}) {
            try {
                Process p = new ProcessBuilder(py, "-c", "import ezdxf").redirectErrorStream(true).start();
                p.getInputStream().readAllBytes();
                if (p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0) {
                    return py;
                }
            } catch (IOException e) {
                // not this one
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return null;
            }
        }
        return null;
    }
}
