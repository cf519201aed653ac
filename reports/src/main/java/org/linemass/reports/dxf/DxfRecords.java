package org.linemass.reports.dxf;

import java.math.BigDecimal;
import java.util.Locale;
import org.linemass.reports.NonFiniteNumber;
import org.linemass.geometry.Vec3;

/**
 * Formats the records the markup adds (LAYER, CIRCLE, LINE, TEXT) as group-code/value lines with
 * the file's own line end; R13 and later get handles (counting up from the first free one), owner
 * and subclass markers; R12 gets the plain form, with handles only when the file uses them.
 * Mutable: hands out handles; one per write.
 */
final class DxfRecords {
    private final String eol;
    private final boolean modern;
    private final boolean handles;
    private final String owner;
    long handle;

    DxfRecords(String eol, boolean modern, boolean handles, long firstHandle, String owner) {
        this.eol = eol;
        this.modern = modern;
        this.handles = modern || handles;
        this.handle = firstHandle;
        this.owner = owner;
    }

    String layer(String name, String tableHandle, int colour) {
        StringBuilder b = new StringBuilder();
        pair(b, 0, "LAYER");
        if (handles) {
            pair(b, 5, nextHandle());
        }
        if (modern) {
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
        if (handles) {
            pair(b, 5, nextHandle());
        }
        if (modern) {
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
        NonFiniteNumber.check(v, "marked-up DXF");
        return new BigDecimal(Double.toString(v)).toPlainString();
    }
}
