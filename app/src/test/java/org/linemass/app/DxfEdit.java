package org.linemass.app;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The demo DXF as group-code pairs, edited entity by handle. */
final class DxfEdit {
    private final List<String[]> pairs = new ArrayList<>();

    static DxfEdit demo() throws Exception {
        DxfEdit d = new DxfEdit();
        List<String> l = Files.readAllLines(CorpusJsonTest.repo().resolve("testdata/demo/garden-planter.dxf"),
                StandardCharsets.UTF_8);
        for (int i = 0; i + 1 < l.size(); i += 2) {
            d.pairs.add(new String[] {l.get(i), l.get(i + 1)});
        }
        return d;
    }

    /** Index of the "0" pair that starts the entity with this handle. */
    private int start(String handle) {
        for (int i = 0; i + 1 < pairs.size(); i++) {
            if (pairs.get(i)[0].strip().equals("0") && pairs.get(i + 1)[0].strip().equals("5")
                    && pairs.get(i + 1)[1].strip().equals(handle)) {
                return i;
            }
        }
        throw new AssertionError("no entity with handle " + handle);
    }

    private int end(int start) {
        int i = start + 1;
        while (!pairs.get(i)[0].strip().equals("0")) {
            i++;
        }
        return i;
    }

    void set(String handle, String code, String value) {
        int s = start(handle);
        for (int i = s + 1; i < end(s); i++) {
            if (pairs.get(i)[0].strip().equals(code)) {
                pairs.get(i)[1] = value;
                return;
            }
        }
        throw new AssertionError("entity " + handle + " has no group " + code);
    }

    void remove(String handle) {
        int s = start(handle);
        pairs.subList(s, end(s)).clear();
    }

    void addLine(String handle, String layer, double x1, double y1, double x2, double y2) {
        int at = entitiesEnd();
        String[][] line = {{"  0", "LINE"}, {"  5", handle}, {"330", "2D"}, {"100", "AcDbEntity"}, {"  8", layer},
            {"100", "AcDbLine"}, {" 10", Double.toString(x1)}, {" 20", Double.toString(y1)}, {" 30", "0.0"},
            {" 11", Double.toString(x2)}, {" 21", Double.toString(y2)}, {" 31", "0.0"}};
        pairs.addAll(at, List.of(line));
    }

    /** Reverses the order of the model-space entities (each kept whole). */
    void reverseEntities() {
        int first = entitiesStart();
        int last = entitiesEnd();
        List<List<String[]>> entities = new ArrayList<>();
        for (int i = first; i < last; ) {
            int e = end(i);
            entities.add(new ArrayList<>(pairs.subList(i, e)));
            i = e;
        }
        java.util.Collections.reverse(entities);
        List<String[]> flat = new ArrayList<>();
        entities.forEach(flat::addAll);
        pairs.subList(first, last).clear();
        pairs.addAll(first, flat);
    }

    private int entitiesStart() {
        for (int i = 0; i < pairs.size(); i++) {
            if (pairs.get(i)[0].strip().equals("2") && pairs.get(i)[1].strip().equals("ENTITIES")) {
                return i + 1;
            }
        }
        throw new AssertionError("no ENTITIES section");
    }

    private int entitiesEnd() {
        for (int i = entitiesStart(); i < pairs.size(); i++) {
            if (pairs.get(i)[0].strip().equals("0") && pairs.get(i)[1].strip().equals("ENDSEC")) {
                return i;
            }
        }
        throw new AssertionError("ENTITIES not closed");
    }

    Path write(Path file) throws Exception {
        StringBuilder s = new StringBuilder();
        for (String[] p : pairs) {
            s.append(p[0]).append('\n').append(p[1]).append('\n');
        }
        return Files.writeString(file, s.toString(), StandardCharsets.UTF_8);
    }
}
