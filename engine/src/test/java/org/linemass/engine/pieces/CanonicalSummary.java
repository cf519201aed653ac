package org.linemass.engine.pieces;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Vec3;

/**
 * A text summary of an analysis that does not depend on segment order, direction or on how a
 * straight is split: per piece its layer, closed flag, length, end points (open pieces) and bends;
 * per finding kind, severity, layer, place, size and entity handles; groups as sorted lists of
 * piece summaries. Numbers are rounded to nanometres (1e-9 m), far above the rounding noise of
 * splitting a line (1e-16 relative) and far below the drawing's features.
 */
final class CanonicalSummary {

    private CanonicalSummary() {
    }

    static String of(PieceAnalysis r) {
        List<String> pieces = new ArrayList<>();
        for (Piece p : r.pieces()) {
            pieces.add(piece(p));
        }
        List<String> findings = new ArrayList<>();
        for (Finding f : r.findings()) {
            List<String> handles = new ArrayList<>(f.entities().stream().map(SourceRef::handle).toList());
            handles.sort(null);
            findings.add(f.kind() + " " + f.severity() + " " + f.layer() + " " + point(f.atM()) + " "
                    + (f.sizeM() == null ? "-" : nm(f.sizeM())) + " " + handles);
        }
        findings.sort(null);
        List<String> groups = new ArrayList<>();
        for (List<Integer> g : r.groups()) {
            List<String> members = new ArrayList<>();
            for (int i : g) {
                members.add(pieces.get(i));
            }
            members.sort(null);
            groups.add(members.toString());
        }
        groups.sort(null);
        List<String> sortedPieces = new ArrayList<>(pieces);
        sortedPieces.sort(null);
        return "pieces " + sortedPieces + "\nfindings " + findings + "\ngroups " + groups;
    }

    private static String piece(Piece p) {
        double len = p.segments().stream().mapToDouble(Curves::length).sum();
        StringBuilder sb = new StringBuilder();
        sb.append(p.layer()).append(p.closed() ? " closed " : " open ").append(nm(len));
        if (!p.closed()) {
            Vec3 a = p.segments().get(0).start();
            Vec3 b = p.segments().get(p.segments().size() - 1).end();
            String pa = point(a);
            String pb = point(b);
            sb.append(' ').append(pa.compareTo(pb) <= 0 ? pa + pb : pb + pa);
        }
        List<String> bends = new ArrayList<>();
        for (Bend b : p.bends()) {
            bends.add(String.format(Locale.ROOT, "%.6f/%s", b.angleDeg(),
                    b.insideRadiusM() == null ? "sharp" : nm(b.insideRadiusM())));
        }
        bends.sort(null);
        sb.append(" bends ").append(bends);
        return sb.toString();
    }

    private static String nm(double m) {
        return Long.toString(Math.round(m * 1e9));
    }

    private static String point(Vec3 p) {
        return p == null ? "-" : "(" + nm(p.x()) + "," + nm(p.y()) + "," + nm(p.z()) + ")";
    }
}
