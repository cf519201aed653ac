package org.linemass.reports.dxf;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.importer.DxfPairs.Pair;

/**
 * Where {@link DxfMarkupWriter} splices, found in one pass over the pairs of an ASCII DXF: the
 * $ACADVER string, the offset of the ENDSEC that closes ENTITIES, the offset of the ENDTAB that
 * closes the LAYER table and that table's handle, the place and value of the LAYER table's entry
 * count (group 70 of its TABLE record), the existing layer names (upper case), the model space
 * block-record handle, the place of the $HANDSEED value, whether the file uses handles ($HANDLING
 * not 0, or any group 5 outside the header) and the first free handle.
 */
final class DxfLayout {
    String version = "";
    int entitiesEnd = -1;
    int layerTableEnd = -1;
    String layerTableHandle = "0";
    String modelSpaceHandle = "";
    int handseedValueOffset = -1;
    int handseedValueLength;
    int layerCountValueOffset = -1;
    int layerCountValueLength;
    int layerCount;
    boolean handles;
    long nextHandle = 1;
    final List<String> layerNames = new ArrayList<>();

    static DxfLayout of(List<Pair> pairs) {
        DxfLayout l = new DxfLayout();
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
                } else if (lastVar.equals("$HANDLING") && p.code() == 70) {
                    l.handles |= !p.value().equals("0");
                } else if (lastVar.equals("$HANDSEED") && p.code() == 5) {
                    l.handseedValueOffset = p.valueOffset();
                    l.handseedValueLength = p.valueLength();
                    maxHandle = Math.max(maxHandle, hex(p.value()) - 1);
                }
                continue;
            }
            // in a DIMSTYLE record group 5 is a block name (its handle is group 105)
            boolean handle = p.code() == 105 || (p.code() == 5 && !entity.equals("DIMSTYLE"));
            if (handle) {
                maxHandle = Math.max(maxHandle, hex(p.value()));
                recordHandle = p.value();
                l.handles = true;
            }
            if (section.equals("TABLES")) {
                if (entity.equals("TABLE") && p.code() == 2) {
                    table = p.value().toUpperCase(Locale.ROOT);
                } else if (entity.equals("TABLE") && p.code() == 5 && table.equals("LAYER")) {
                    l.layerTableHandle = p.value();
                } else if (entity.equals("TABLE") && p.code() == 70 && table.equals("LAYER")
                        && l.layerCountValueOffset < 0) {
                    l.layerCountValueOffset = p.valueOffset();
                    l.layerCountValueLength = p.valueLength();
                    l.layerCount = count(p.value());
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

    private static int count(String s) {
        try {
            return Math.max(0, Integer.parseInt(s.trim()));
        } catch (NumberFormatException e) {
            return 0;
        }
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
