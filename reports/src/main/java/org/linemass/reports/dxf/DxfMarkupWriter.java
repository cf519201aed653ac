package org.linemass.reports.dxf;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.DxfPairs;
import org.linemass.importer.DxfPairs.Pair;

/**
 * Writes a copy of an ASCII DXF drawing with a markup layer added. The original bytes are copied
 * through unchanged; new content is spliced in at four places only: a layer record before the
 * ENDTAB of the LAYER table and that table's entry count (group 70) raised by one (when the file
 * has a LAYER table), the new entities before the ENDSEC of the ENTITIES section, and a raised
 * $HANDSEED (when the header has one) so that the new handles stay unique. The new records get
 * handles when the file is R13 or later or uses handles ($HANDLING 1, as R12 files often do).
 *
 * <p>Each finding with a place gets a CIRCLE and a TEXT "n kind" (n is the finding's number in
 * every report; labels of findings at the same place are stacked one under the other); the centre
 * of gravity (or the length centroid without mass) gets a CIRCLE, two LINEs and the TEXT "CG"; a
 * drawing read incompletely gets one more TEXT saying so. Sizes are 1 % of the drawing's extent.
 * Coordinates are converted back from metres to drawing units. Files from R13 on get subclass
 * markers; R12 files get the plain R12 form. The pairs and their byte places come from the importer's
 * own tokenizer ({@link DxfPairs}), so the copy is spliced where the reader sees the pairs. Binary
 * DXF is refused (IOException), and so is a
 * drawing whose group pairs are out of step before its 0/EOF (a code line that is not a number,
 * an unpaired last line, no EOF): the message names the line. Anything after 0/EOF is not copied,
 * so the copy always has whole pairs and ends with 0/EOF.
 */
public final class DxfMarkupWriter {

    /** Name of the added layer (a numeric suffix is added if the drawing already has one). */
    public static final String LAYER = "LINEMASS_FINDINGS";
    /** Marker size as a share of the drawing's bounding-box diagonal (chosen to be visible, no source). */
    private static final double MARKER_SHARE = 0.01;
    /** AutoCAD colour index of the layer (1 = red) and of the centre-of-gravity marker (5 = blue). */
    private static final int LAYER_COLOUR = 1;
    private static final int COG_COLOUR = 5;
    /** Line pitch of stacked labels, in text heights. */
    private static final double LABEL_PITCH = 1.5;

    private DxfMarkupWriter() {
    }

    /** Writes the marked-up copy of {@code original} (the input file's bytes) to {@code out}. */
    public static void write(byte[] original, DrawingResult result, OutputStream out) throws IOException {
        String file = result.drawing().file();
        if (DxfPairs.isBinary(original)) {
            throw new IOException(file + ": a marked-up copy can only be written for ASCII DXF, this file is binary DXF");
        }
        List<Pair> pairs;
        try {
            // the importer's own tokenizer: the copy splices where the reader sees the pairs
            pairs = DxfPairs.upToEof(file, original);
        } catch (DxfInputException e) {
            // the pairs are out of step (a code line that is not a number, an unpaired last line) or
            // the file has no 0/EOF: a copy would carry the break into every reader
            throw new IOException(file + (e.line() > 0 ? ":" + e.line() : "") + ": cannot write a marked-up copy: "
                    + e.problem());
        }
        String text = new String(original, StandardCharsets.ISO_8859_1);
        String eol = text.contains("\r\n") ? "\r\n" : "\n";
        Pair last = pairs.get(pairs.size() - 1);
        // everything after 0/EOF is ignored by readers and is not copied: the copy ends with the EOF line
        int copyEnd = end(text, last);
        boolean addEol = copyEnd == 0 || text.charAt(copyEnd - 1) != '\n';
        DxfLayout layout = DxfLayout.of(pairs);
        if (layout.entitiesEnd < 0) {
            throw new IOException(file + ":" + lineOf(text, last.offset()) + ": no ENTITIES section "
                    + "before the end of the drawing to add the markup to");
        }
        String layer = LAYER;
        for (int i = 2; layout.layerNames.contains(layer.toUpperCase(Locale.ROOT)); i++) {
            layer = LAYER + "_" + i;
        }
        boolean modern = layout.version.compareTo("AC1012") >= 0;
        DxfRecords e = new DxfRecords(eol, modern, layout.handles, layout.nextHandle, layout.modelSpaceHandle);
        double perMetre = 1.0 / result.drawing().unit().metres();
        double size = markerSize(result) * perMetre;

        List<Splice> splices = new ArrayList<>();
        if (layout.layerTableEnd >= 0) {
            splices.add(new Splice(layout.layerTableEnd, 0, e.layer(layer, layout.layerTableHandle, LAYER_COLOUR)));
            if (layout.layerCountValueOffset >= 0) {
                // the table's entry count grows by the one record added (readers may size the table by it)
                splices.add(new Splice(layout.layerCountValueOffset, layout.layerCountValueLength,
                        padLike(text.substring(layout.layerCountValueOffset,
                                layout.layerCountValueOffset + layout.layerCountValueLength), layout.layerCount + 1)));
            }
        }
        StringBuilder ents = new StringBuilder();
        Map<String, Integer> stacked = new HashMap<>();
        int n = 0;
        for (Finding f : result.findings()) {
            n++;
            if (f.atM() == null || !f.atM().isFinite() || !f.atM().times(perMetre).isFinite()) {
                continue; // no place, or one beyond the range of numbers in drawing units
            }
            Vec3 p = f.atM().times(perMetre);
            // labels of findings at one place are stacked downwards instead of printed over each other
            String cell = Math.round(p.x() / size) + "," + Math.round(p.y() / size) + "," + Math.round(p.z() / size);
            int below = stacked.merge(cell, 1, Integer::sum) - 1;
            ents.append(e.circle(layer, p, size, 0));
            ents.append(e.text(layer, p.plus(new Vec3(size, size - LABEL_PITCH * size * below, 0)), size,
                    n + " " + ascii(f.kind()), 0));
        }
        Vec3 cog = result.totals().centroidM() != null ? result.totals().centroidM() : result.totals().lengthCentroidM();
        if (cog != null && !cog.times(perMetre).isFinite()) {
            cog = null;
        }
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
        if (layout.handseedValueOffset >= 0 && (modern || layout.handles)) {
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
        out.write(original, pos, copyEnd - pos);
        if (addEol) {
            out.write(eol.getBytes(StandardCharsets.ISO_8859_1));
        }
        out.flush();
    }

    /** Offset just past the value line of {@code p}, with its line end. */
    private static int end(String text, Pair p) {
        int e = p.valueOffset() + p.valueLength();
        if (e < text.length() && text.charAt(e) == '\r') {
            e++;
        }
        if (e < text.length() && text.charAt(e) == '\n') {
            e++;
        }
        return e;
    }

    /** The 1-based line number of the character at {@code offset}. */
    private static int lineOf(String text, int offset) {
        int line = 1;
        for (int i = 0; i < offset && i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                line++;
            }
        }
        return line;
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
        // an extent that overflows (places near the double range) gets the fallback size, never Infinity
        double size = MARKER_SHARE * diag;
        return diag > 0 && Double.isFinite(size / r.drawing().unit().metres()) ? size : fallback;
    }

    /** {@code value} right-aligned to the width of {@code original} when that was padded with spaces. */
    private static String padLike(String original, int value) {
        String v = Integer.toString(value);
        if (original.startsWith(" ") && original.length() > v.length()) {
            return " ".repeat(original.length() - v.length()) + v;
        }
        return v;
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
}
