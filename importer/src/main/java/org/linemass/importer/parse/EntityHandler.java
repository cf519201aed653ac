package org.linemass.importer.parse;

import java.io.IOException;
import java.util.List;
import org.linemass.drawing.ImportNote;
import org.linemass.geometry.Provenance;
import org.linemass.importer.entity.Converters;
import org.linemass.importer.entity.EntitySkip;
import org.linemass.importer.entity.FaceEdges;
import org.linemass.importer.entity.InsertSpec;
import org.linemass.importer.entity.MlinePath;
import org.linemass.importer.entity.MlineStyle;
import org.linemass.importer.entity.PolylineBuilder;
import org.linemass.importer.read.ReadException;
import org.linemass.importer.read.Record;

/**
 * Handles one entity record of an ENTITIES or BLOCKS section, including the records that belong
 * to it (VERTEX...SEQEND after POLYLINE, ATTRIB...SEQEND after an INSERT with 66 = 1). Curve
 * entities become segments of the target block; an entity that cannot be used is skipped with an
 * error note; every other type is counted. Paper-space entities are only counted, unless the
 * options ask for paper space: then they go to model space, marked as coming through
 * {@link #PAPER_SPACE} in their provenance.
 */
final class EntityHandler {

    /** Note kind of a SPLINE whose missing knots were replaced by a clamped uniform knot vector. */
    static final String KNOTS_ASSUMED = "knots_assumed";

    private final String file;
    private final ReadSettings options;
    private final List<ImportNote> notes;
    private final boolean binary;
    /** Block name put in the provenance of paper-space entities read into model space. */
    static final String PAPER_SPACE = "*Paper_Space";

    /** Paper-space entities left out. */
    long paperSpaceEntities;
    /** Paper-space entities read into model space (when the options ask for it). */
    long paperSpaceRead;
    /** Where paper-space entities go when the options ask for them; null otherwise. */
    BlockBuilder paperTarget;
    /** Warnings of one curve conversion; reused (cleared before each entity). */
    private final List<String> converterWarnings = new java.util.ArrayList<>();
    /** Layer names used by entities read into blocks (pooled strings, so lookups are cheap). */
    final java.util.Set<String> usedLayers = new java.util.HashSet<>();
    /** Invisible entities (group 60 = 1) left out, per DXF type (sorted, for a stable note). */
    final java.util.Map<String, Integer> invisible = new java.util.TreeMap<>();
    /** MLINE and LEADER entities counted but not read (the options did not ask for them), per type. */
    final java.util.Map<String, Integer> draftingLeftOut = new java.util.TreeMap<>();
    /** MLINEs read on request, drawn once the styles are known ({@link #finishMlines}). */
    private final List<PendingMline> mlines = new java.util.ArrayList<>();

    /** An MLINE waiting for its style, and the block it goes to. */
    private record PendingMline(BlockBuilder target, MlinePath path) {
    }

    /** The layer name last added to {@link #usedLayers}. */
    private String lastLayer;

    EntityHandler(String file, boolean binary, ReadSettings options, List<ImportNote> notes) {
        this.file = file;
        this.binary = binary;
        this.options = options;
        this.notes = notes;
    }

    /** Handles {@code r}; reads its follower records from {@code in}. Null target = paper space. */
    void handle(Record r, RecordStream in, BlockBuilder target) throws ReadException, IOException {
        boolean fromPaper = target == null && paperTarget != null;
        if (fromPaper) {
            target = paperTarget;
            paperSpaceRead++;
        }
        String type = r.type();
        boolean paper = target == null;
        int line = lineOf(r.position());
        String layer = r.layer();
        if (!paper && !options.invisible() && r.num(60, 0) == 1) {
            leaveOutInvisible(r, in);
            return;
        }
        if (type.equals("POLYLINE")) {
            handlePolyline(r, in, paper ? null : target, provenance(r, layer, line, type, fromPaper));
            return;
        }
        if (type.equals("INSERT")) {
            Provenance p = provenance(r, layer, line, type, fromPaper);
            boolean attribs = r.num(66, 0) == 1;
            if (paper) {
                paperSpaceEntities++;
            } else if (r.hasBadValue()) {
                skip(p, badValue(r));
            } else {
                usedLayers.add(layer);
                try {
                    target.insertSpecs.add(InsertSpec.read(r, p));
                } catch (EntitySkip e) {
                    skip(p, e.getMessage());
                }
            }
            if (attribs) {
                skipFollowers(in, "ATTRIB", paper ? null : target);
            }
            return;
        }
        if (paper) {
            paperSpaceEntities++;
            return;
        }
        useLayer(layer);
        boolean faceEdges = options.faceEdges() && FaceEdges.isFace(type);
        boolean drafting = options.mlinesAndLeaders() && Converters.isDraftingPath(type);
        if (!Converters.isCurveType(type) && !faceEdges && !drafting) {
            target.countOther(type.isEmpty() ? "(unnamed)" : type);
            if (Converters.isDraftingPath(type)) {
                draftingLeftOut.merge(type, 1, Integer::sum);
            }
            if (NotWeighed.isWireLike(type)) {
                NotWeighed.count(target, layer, type);
            }
            return;
        }
        Provenance p = provenance(r, layer, line, type, fromPaper);
        if (faceEdges) {
            if (r.hasBadValue()) {
                skip(p, badValue(r));
                return;
            }
            int before = target.segments.size();
            try {
                FaceEdges.convert(r, p, target.segments);
                target.countCurve(type);
                target.wireLayers.add(layer);
            } catch (EntitySkip e) {
                target.segments.subList(before, target.segments.size()).clear();
                skip(p, e.getMessage());
            }
            return;
        }
        if (r.hasBadValue()) {
            skip(p, badValue(r));
            return;
        }
        if (type.equals("MLINE")) {
            try {
                mlines.add(new PendingMline(target, MlinePath.read(r, p, options.maxVertices())));
            } catch (EntitySkip e) {
                skip(p, e.getMessage());
            }
            return;
        }
        converterWarnings.clear();
        try {
            Converters.convert(r, p, options.maxVertices(), options.maxControlPoints(), target.segments,
                    converterWarnings);
            target.countCurve(type);
            target.wireLayers.add(layer);
            for (String w : converterWarnings) {
                notes.add(Notes.of("warning", KNOTS_ASSUMED, file, line, type, r.handle(), layer, w));
            }
        } catch (EntitySkip e) {
            notes.add(Notes.of("error", "skipped_entity", file, line, type, r.handle(), layer, e.getMessage()));
        }
    }

    /**
     * Draws the MLINEs read so far with their styles (looked up by the handle in their group 340,
     * then by name ignoring case), each appended to its block after the block's other entities.
     */
    void finishMlines(java.util.Map<String, MlineStyle> byHandle, java.util.Map<String, MlineStyle> byName) {
        for (PendingMline m : mlines) {
            MlinePath path = m.path();
            MlineStyle style = byHandle.get(path.styleHandle().toUpperCase(java.util.Locale.ROOT));
            if (style == null) {
                style = byName.get(path.styleName().toUpperCase(java.util.Locale.ROOT));
            }
            try {
                path.convert(style, m.target().segments);
                m.target().countCurve("MLINE");
                m.target().wireLayers.add(path.source().layer());
            } catch (EntitySkip e) {
                skip(path.source(), e.getMessage());
            }
        }
        mlines.clear();
    }

    /**
     * Counts an invisible entity and reads past the records that belong to it (the vertices of a
     * POLYLINE, the attributes of an INSERT), so that none of it reaches the block.
     */
    private void leaveOutInvisible(Record r, RecordStream in) throws ReadException, IOException {
        String type = r.type();
        invisible.merge(type.isEmpty() ? "(unnamed)" : type, 1, Integer::sum);
        if (type.equals("POLYLINE")) {
            long startPos = r.position();
            String handle = r.handle();
            while (true) {
                Record v = in.next();
                if (v == null) {
                    throw in.source().error(startPos, type, handle,
                            "file ends before the SEQEND that closes this POLYLINE");
                }
                if (!v.type().equals("VERTEX")) {
                    if (!v.type().equals("SEQEND")) {
                        in.pushBack();
                    }
                    return;
                }
            }
        }
        if (type.equals("INSERT") && r.num(66, 0) == 1) {
            skipFollowers(in, "ATTRIB", null);
        }
    }

    /** Notes {@code layer} as used; the same (pooled) name as last time needs no set lookup. */
    private void useLayer(String layer) {
        if (layer != lastLayer) {
            usedLayers.add(layer);
            lastLayer = layer;
        }
    }

    /**
     * The provenance of record {@code r}, without a handle string when the handle is a number;
     * through {@link #PAPER_SPACE} when a paper-space entity is read into model space.
     */
    private Provenance provenance(Record r, String layer, int line, String type, boolean fromPaper) {
        Provenance p = r.numericHandle() ? Provenance.ofHandleValue(file, layer, line, r.handleValue(), type)
                : Provenance.of(file, layer, line, r.handle(), type);
        return fromPaper ? p.throughBlock(PAPER_SPACE) : p;
    }

    private void handlePolyline(Record r, RecordStream in, BlockBuilder target, Provenance p)
            throws ReadException, IOException {
        boolean bad = r.hasBadValue();
        String badMessage = bad ? badValue(r) : "";
        PolylineBuilder b = PolylineBuilder.start(r, options.maxVertices());
        long startPos = r.position();
        String type = r.type();
        String handle = r.handle();
        while (true) {
            Record v = in.next();
            if (v == null) {
                throw in.source().error(startPos, type, handle,
                        "file ends before the SEQEND that closes this POLYLINE");
            }
            if (v.type().equals("VERTEX")) {
                b.vertex(v);
                continue;
            }
            if (!v.type().equals("SEQEND")) {
                in.pushBack();
            }
            break;
        }
        if (target == null) {
            paperSpaceEntities++;
            return;
        }
        usedLayers.add(p.layer());
        String counted = b.countedType();
        if (counted == null) {
            String mesh = b.meshKind().equals("polyface mesh") ? "POLYFACE_MESH" : "POLYGON_MESH";
            target.countOther(mesh);
            NotWeighed.count(target, p.layer(), mesh);
            return;
        }
        if (bad) {
            skip(p, badMessage);
            return;
        }
        try {
            Converters.finish(b, p, target.segments);
            target.countCurve(counted);
            target.wireLayers.add(p.layer());
        } catch (EntitySkip e) {
            skip(p, e.getMessage());
        }
    }

    private void skipFollowers(RecordStream in, String followerType, BlockBuilder target)
            throws ReadException, IOException {
        while (true) {
            Record a = in.next();
            if (a == null) {
                return;
            }
            if (a.type().equals(followerType)) {
                if (target != null) {
                    target.countOther(followerType);
                }
                continue;
            }
            if (!a.type().equals("SEQEND")) {
                in.pushBack();
            }
            return;
        }
    }

    private void skip(Provenance p, String message) {
        notes.add(Notes.of("error", "skipped_entity", file, p.line(), p.entityType(), p.handle(), p.layer(),
                message));
    }

    private String badValue(Record r) {
        String where = binary ? "byte " + r.badPosition() : "line " + (r.badPosition() + 1);
        return "value of group code " + r.badCode() + " at " + where + " is not a number: '" + r.badText() + "'";
    }

    private static int lineOf(long position) {
        return (int) Math.min(position, Integer.MAX_VALUE);
    }
}
