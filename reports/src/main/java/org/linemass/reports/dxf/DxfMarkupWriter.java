package org.linemass.reports.dxf;

import java.io.IOException;
import java.io.OutputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;
import org.linemass.reports.dxf.DxfPairScanner.Pair;

/**
 * Writes a copy of an ASCII DXF drawing with a markup layer added. The original bytes are copied
 * through unchanged; new content is spliced in at three places only: a layer record before the
 * ENDTAB of the LAYER table (when the file has one), the new entities before the ENDSEC of the
 * ENTITIES section, and a raised $HANDSEED (when the header has one) so that the new handles stay
 * unique. Each finding with a place gets a CIRCLE and a TEXT "n kind" (n is the finding's number in
 * every report); the centre of gravity (or the length centroid without mass) gets a CIRCLE, two
 * LINEs and the TEXT "CG"; a drawing read incompletely gets one more TEXT saying so. Sizes are 1 % of the drawing's extent. Coordinates are converted back
 * from metres to drawing units. Files from R13 on get handles and subclass markers; R12 files get
 * the plain R12 form. Binary DXF is refused (IOException).
 */
public final class DxfMarkupWriter {

    /** Name of the added layer (a numeric suffix is added if the drawing already has one). */
    public static final String LAYER = "LINEMASS_FINDINGS";
    /** Marker size as a share of the drawing's bounding-box diagonal (chosen to be visible, no source). */
    private static final double MARKER_SHARE = 0.01;
    /** AutoCAD colour index of the layer (1 = red) and of the centre-of-gravity marker (5 = blue). */
    private static final int LAYER_COLOUR = 1;
    private static final int COG_COLOUR = 5;
    private static final String BINARY_SENTINEL = "AutoCAD Binary DXF";

    private DxfMarkupWriter() {
    }

    /** Writes the marked-up copy of {@code original} (the input file's bytes) to {@code out}. */
    public static void write(byte[] original, DrawingResult result, OutputStream out) throws IOException {
        String text = new String(original, StandardCharsets.ISO_8859_1);
        if (text.startsWith(BINARY_SENTINEL)) {
            throw new IOException(result.drawing().file() + ": a marked-up copy can only be written for ASCII DXF, "
                    + "this file is binary DXF");
        }
        String eol = text.contains("\r\n") ? "\r\n" : "\n";
        Layout layout = Layout.of(DxfPairScanner.scan(text));
        if (layout.entitiesEnd < 0) {
            throw new IOException(result.drawing().file() + ": no ENTITIES section to add the markup to");
        }
        String layer = LAYER;
        for (int i = 2; layout.layerNames.contains(layer.toUpperCase(Locale.ROOT)); i++) {
            layer = LAYER + "_" + i;
        }
        boolean modern = layout.version.compareTo("AC1012") >= 0;
        Emitter e = new Emitter(eol, modern, layout.nextHandle, layout.modelSpaceHandle);
        double perMetre = 1.0 / result.drawing().unit().metres();
        double size = markerSize(result) * perMetre;

        List<Splice> splices = new ArrayList<>();
        if (layout.layerTableEnd >= 0) {
            splices.add(new Splice(layout.layerTableEnd, 0, e.layer(layer, layout.layerTableHandle, LAYER_COLOUR)));
        }
        StringBuilder ents = new StringBuilder();
        int n = 0;
        for (Finding f : result.findings()) {
            n++;
            if (f.atM() == null || !f.atM().isFinite()) {
                continue;
            }
            Vec3 p = f.atM().times(perMetre);
            ents.append(e.circle(layer, p, size, 0));
            ents.append(e.text(layer, p.plus(new Vec3(size, size, 0)), size, n + " " + ascii(f.kind()), 0));
        }
        Vec3 cog = result.totals().centroidM() != null ? result.totals().centroidM() : result.totals().lengthCentroidM();
        if (cog != null && cog.isFinite()) {
            Vec3 c = cog.times(perMetre);
            ents.append(e.circle(layer, c, size, COG_COLOUR));
            ents.append(e.line(layer, c.minus(new Vec3(1.5 * size, 0, 0)), c.plus(new Vec3(1.5 * size, 0, 0)), COG_COLOUR));
            ents.append(e.line(layer, c.minus(new Vec3(0, 1.5 * size, 0)), c.plus(new Vec3(0, 1.5 * size, 0)), COG_COLOUR));
            ents.append(e.text(layer, c.plus(new Vec3(size, -2 * size, 0)), size, "CG", COG_COLOUR));
        }
        if (!result.complete()) {
            Vec3 at = cog != null && cog.isFinite() ? cog.times(perMetre).plus(new Vec3(size, -4 * size, 0))
                    : Vec3.ZERO;
            ents.append(e.text(layer, at, size, "TOTALS INCOMPLETE: PART OF THE DRAWING WAS NOT COUNTED", 0));
        }
        splices.add(new Splice(layout.entitiesEnd, 0, ents.toString()));
        if (layout.handseedValueOffset >= 0 && modern) {
            splices.add(new Splice(layout.handseedValueOffset, layout.handseedValueLength,
                    Long.toHexString(e.handle).toUpperCase(Locale.ROOT)));
        }
        splices.sort(Comparator.comparingInt(Splice::offset));
        int pos = 0;
        for (Splice s : splices) {
            out.write(original, pos, s.offset - pos);
            out.write(s.text.getBytes(StandardCharsets.ISO_8859_1));
            pos = s.offset + s.remove;
        }
        out.write(original, pos, original.length - pos);
        out.flush();
    }

    private static double markerSize(DrawingResult r) {
        double[] min = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] max = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        List<Vec3> pts = new ArrayList<>();
        for (PieceResult p : r.pieces()) {
            pts.add(p.startM());
            pts.add(p.endM());
            pts.add(p.centroidM());
        }
        r.findings().forEach(f -> pts.add(f.atM()));
        for (Vec3 v : pts) {
            if (v == null || !v.isFinite()) {
                continue;
            }
            for (int a = 0; a < 3; a++) {
                min[a] = Math.min(min[a], v.get(a));
                max[a] = Math.max(max[a], v.get(a));
            }
        }
        double diag = min[0] > max[0] ? 0 : new Vec3(max[0] - min[0], max[1] - min[1], max[2] - min[2]).norm();
        double fallback = 0.01 * r.drawing().unit().metres();
        return diag > 0 ? MARKER_SHARE * diag : fallback;
    }

    private static String ascii(String s) {
        StringBuilder b = new StringBuilder();
        for (char c : (s == null ? "" : s).toCharArray()) {
            b.append(c >= 32 && c < 127 ? c : '?');
        }
        return b.toString();
    }

    private record Splice(int offset, int remove, String text) {
    }

    /** Where to splice, found by one pass over the pairs. */
    private static final class Layout {
        String version = "";
        int entitiesEnd = -1;
        int layerTableEnd = -1;
        String layerTableHandle = "0";
        String modelSpaceHandle = "";
        int handseedValueOffset = -1;
        int handseedValueLength;
        long nextHandle = 1;
        final List<String> layerNames = new ArrayList<>();

        static Layout of(List<Pair> pairs) {
            Layout l = new Layout();
            String section = "";
            String table = "";
            String entity = "";
            String lastVar = "";
            String recordHandle = "";
            boolean expectSectionName = false;
            long maxHandle = 0;
            for (int i = 0; i < pairs.size(); i++) {
                Pair p = pairs.get(i);
                if (p.code() == 0) {
                    entity = p.value();
                    recordHandle = "";
                    if (entity.equals("SECTION")) {
                        expectSectionName = true;
                    } else if (entity.equals("ENDSEC")) {
                        if (section.equals("ENTITIES") && l.entitiesEnd < 0) {
                            l.entitiesEnd = p.offset();
                        }
                        section = "";
                    } else if (entity.equals("ENDTAB")) {
                        if (table.equals("LAYER") && l.layerTableEnd < 0) {
                            l.layerTableEnd = p.offset();
                        }
                        table = "";
                    }
                    continue;
                }
                if (p.code() == 2 && expectSectionName) {
                    section = p.value().toUpperCase(Locale.ROOT);
                    expectSectionName = false;
                    continue;
                }
                if (section.equals("HEADER")) {
                    if (p.code() == 9) {
                        lastVar = p.value();
                    } else if (lastVar.equals("$ACADVER") && p.code() == 1) {
                        l.version = p.value();
                    } else if (lastVar.equals("$HANDSEED") && p.code() == 5) {
                        l.handseedValueOffset = p.valueOffset();
                        l.handseedValueLength = p.valueLength();
                        maxHandle = Math.max(maxHandle, hex(p.value()) - 1);
                    }
                    continue;
                }
                if (p.code() == 5 || p.code() == 105) {
                    maxHandle = Math.max(maxHandle, hex(p.value()));
                    recordHandle = p.value();
                }
                if (section.equals("TABLES")) {
                    if (entity.equals("TABLE") && p.code() == 2) {
                        table = p.value().toUpperCase(Locale.ROOT);
                    } else if (entity.equals("TABLE") && p.code() == 5 && table.equals("LAYER")) {
                        l.layerTableHandle = p.value();
                    } else if (entity.equals("LAYER") && p.code() == 2) {
                        l.layerNames.add(p.value().toUpperCase(Locale.ROOT));
                    } else if (entity.equals("BLOCK_RECORD") && p.code() == 2
                            && p.value().equalsIgnoreCase("*Model_Space")) {
                        l.modelSpaceHandle = recordHandle;
                    }
                }
            }
            l.nextHandle = maxHandle + 1;
            return l;
        }

        private static long hex(String s) {
            try {
                long v = Long.parseUnsignedLong(s.trim(), 16);
                return v < 0 ? 0 : v;
            } catch (NumberFormatException e) {
                return 0;
            }
        }
    }

    /** Formats new DXF records. */
    private static final class Emitter {
        private final String eol;
        private final boolean modern;
        private final String owner;
        long handle;

        Emitter(String eol, boolean modern, long firstHandle, String owner) {
            this.eol = eol;
            this.modern = modern;
            this.handle = firstHandle;
            this.owner = owner;
        }

        String layer(String name, String tableHandle, int colour) {
            StringBuilder b = new StringBuilder();
            pair(b, 0, "LAYER");
            if (modern) {
                pair(b, 5, nextHandle());
                pair(b, 330, tableHandle);
                pair(b, 100, "AcDbSymbolTableRecord");
                pair(b, 100, "AcDbLayerTableRecord");
            }
            pair(b, 2, name);
            pair(b, 70, "0");
            pair(b, 62, Integer.toString(colour));
            pair(b, 6, "Continuous");
            return b.toString();
        }

        String circle(String layer, Vec3 c, double r, int colour) {
            StringBuilder b = head("CIRCLE", layer, colour, "AcDbCircle");
            point(b, 10, c);
            pair(b, 40, num(r));
            return b.toString();
        }

        String line(String layer, Vec3 a, Vec3 z, int colour) {
            StringBuilder b = head("LINE", layer, colour, "AcDbLine");
            point(b, 10, a);
            point(b, 11, z);
            return b.toString();
        }

        String text(String layer, Vec3 at, double height, String content, int colour) {
            StringBuilder b = head("TEXT", layer, colour, "AcDbText");
            point(b, 10, at);
            pair(b, 40, num(height));
            pair(b, 1, content);
            if (modern) {
                pair(b, 100, "AcDbText");
            }
            return b.toString();
        }

        private StringBuilder head(String type, String layer, int colour, String subclass) {
            StringBuilder b = new StringBuilder();
            pair(b, 0, type);
            if (modern) {
                pair(b, 5, nextHandle());
                if (!owner.isEmpty()) {
                    pair(b, 330, owner);
                }
                pair(b, 100, "AcDbEntity");
            }
            pair(b, 8, layer);
            if (colour != 0) {
                pair(b, 62, Integer.toString(colour));
            }
            if (modern) {
                pair(b, 100, subclass);
            }
            return b;
        }

        private String nextHandle() {
            return Long.toHexString(handle++).toUpperCase(Locale.ROOT);
        }

        private void point(StringBuilder b, int code, Vec3 p) {
            pair(b, code, num(p.x()));
            pair(b, code + 10, num(p.y()));
            pair(b, code + 20, num(p.z()));
        }

        private void pair(StringBuilder b, int code, String value) {
            b.append(String.format(Locale.ROOT, "%3d", code)).append(eol).append(value).append(eol);
        }

        private static String num(double v) {
            return new BigDecimal(Double.toString(v)).toPlainString();
        }
    }
}
