package org.linemass.reports.dxf;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.reports.dxf.DxfPairScanner.Pair;

/**
 * Where {@link DxfMarkupWriter} splices, found in one pass over the pairs of an ASCII DXF: the
 * $ACADVER string, the offset of the ENDSEC that closes ENTITIES, the offset of the ENDTAB that
 * closes the LAYER table and that table's handle, the existing layer names (upper case), the model
 * space block-record handle, the place of the $HANDSEED value and the first free handle.
 */
final class DxfLayout {
    String version = "";
    int entitiesEnd = -1;
    int layerTableEnd = -1;
    String layerTableHandle = "0";
    String modelSpaceHandle = "";
    int handseedValueOffset = -1;
    int handseedValueLength;
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
