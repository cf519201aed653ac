package org.linemass.engine.testing;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;
import org.linemass.drawing.Layer;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.geometry.Affine;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** A small builder of drawing models for tests (the importer is not needed). Not thread-safe. */
public final class Drawings {

    private final Map<String, BlockBuilder> blocks = new HashMap<>();
    private final Map<String, Layer> layers = new HashMap<>();
    private final List<ImportNote> notes = new ArrayList<>();
    private LengthUnit unit = LengthUnit.MILLIMETRE;
    private UnitSource unitSource = UnitSource.HEADER;
    private int line = 100;

    public static Drawings create() {
        return new Drawings();
    }

    public Drawings unit(LengthUnit u, UnitSource s) {
        unit = u;
        unitSource = s;
        return this;
    }

    public Drawings layer(String name, boolean on, boolean frozen) {
        layers.put(name, new Layer(name, on, frozen, 7, true));
        return this;
    }

    public Drawings note(ImportNote n) {
        notes.add(n);
        return this;
    }

    /** The builder of a block (created on first use); {@link Drawing#MODEL_SPACE} for model space. */
    public BlockBuilder block(String name) {
        return blocks.computeIfAbsent(name, BlockBuilder::new);
    }

    public BlockBuilder model() {
        return block(Drawing.MODEL_SPACE);
    }

    public Provenance src(String layer, String type) {
        return Provenance.of("test.dxf", layer, line++, Integer.toHexString(line), type);
    }

    public Drawing build() {
        Map<String, Block> b = new HashMap<>();
        model();
        blocks.forEach((k, v) -> b.put(k, v.build()));
        return new Drawing("test.dxf", "AC1015", false, unit, unitSource, layers, b, 0, notes);
    }

    /** Builds one block. */
    public final class BlockBuilder {
        private final String name;
        private final List<Segment> segments = new ArrayList<>();
        private final List<Insert> inserts = new ArrayList<>();
        private final Map<String, Integer> curves = new HashMap<>();
        private final Map<String, Integer> other = new HashMap<>();

        BlockBuilder(String name) {
            this.name = name;
        }

        public BlockBuilder line(String layer, Vec3 a, Vec3 b) {
            segments.add(new Straight(a, b, src(layer, "LINE")));
            curves.merge("LINE", 1, Integer::sum);
            return this;
        }

        public BlockBuilder arc(String layer, Vec3 c, double r, double t0, double t1) {
            segments.add(CircularArc.of(c, r, Vec3.X, Vec3.Y, t0, t1, src(layer, "ARC")));
            curves.merge("ARC", 1, Integer::sum);
            return this;
        }

        public BlockBuilder segment(Segment s) {
            segments.add(s);
            curves.merge(s.source().entityType(), 1, Integer::sum);
            return this;
        }

        public BlockBuilder text(int n) {
            other.merge("TEXT", n, Integer::sum);
            return this;
        }

        public BlockBuilder insert(String block, String layer, Affine placement) {
            inserts.add(Insert.single(block, placement, src(layer, "INSERT")));
            return this;
        }

        public BlockBuilder array(String block, String layer, Affine placement, int cols, int rows, Vec3 cs,
                Vec3 rs) {
            inserts.add(new Insert(block, placement, cols, rows, cs, rs, src(layer, "INSERT")));
            return this;
        }

        public Drawings done() {
            return Drawings.this;
        }

        Block build() {
            return new Block(name, Vec3.ZERO, segments, inserts, curves, other);
        }
    }
}
