package org.linemass.importer.parse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Layer;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.geometry.Vec3;
import org.linemass.importer.entity.EntitySkip;
import org.linemass.importer.entity.MlineStyle;
import org.linemass.importer.read.GroupSource;
import org.linemass.importer.read.ReadException;
import org.linemass.importer.read.Record;
import org.linemass.importer.read.RecordReader;

/**
 * Reads the sections of one DXF file into a {@link Drawing}: HEADER (version, units, code page),
 * TABLES (the LAYER table), BLOCKS and ENTITIES; other sections are skipped; reading stops at
 * {@code 0 EOF} (anything after it is ignored) or at a clean end of input between sections. The
 * structure must hold: the first record is {@code 0 SECTION}, every section ends with
 * {@code 0 ENDSEC}, every block with {@code 0 ENDBLK}; otherwise an input error names the place.
 */
public final class DrawingReader {

    /** Groups allowed in one record beyond the vertex limit: a generous allowance for metadata. */
    private static final int RECORD_GROUP_ALLOWANCE = 1 << 16;
    /** Groups per polyline vertex at most (10, 20, 40, 41, 42, 91 and a margin). */
    private static final int GROUPS_PER_VERTEX = 8;

    private final GroupSource src;
    private final ReadSettings options;
    private final String file;
    private final List<ImportNote> notes = new ArrayList<>();
    private final Map<String, Layer> layers = new LinkedHashMap<>();
    private final Map<String, BlockBuilder> blocks = new LinkedHashMap<>();
    private final EntityHandler handler;
    private final RecordStream in;
    private HeaderData header = HeaderData.NONE;

    private DrawingReader(GroupSource src, ReadSettings options) {
        this.src = src;
        this.options = options;
        this.file = src.file();
        this.handler = new EntityHandler(file, src.binary(), options, notes);
        long maxGroups = Math.min(Integer.MAX_VALUE - 16L,
                (long) options.maxVertices() * GROUPS_PER_VERTEX + RECORD_GROUP_ALLOWANCE);
        this.in = new RecordStream(new RecordReader(src, (int) maxGroups));
        blocks.put(Drawing.MODEL_SPACE, new BlockBuilder(Drawing.MODEL_SPACE, Vec3.ZERO));
        if (options.paperSpace()) {
            handler.paperTarget = blocks.get(Drawing.MODEL_SPACE);
        }
    }

    /** Reads the whole drawing from {@code src}. */
    public static Drawing read(GroupSource src, ReadSettings options) throws ReadException, IOException {
        return new DrawingReader(src, options).read();
    }

    private Drawing read() throws ReadException, IOException {
        Record r = in.next();
        if (r == null) {
            throw src.error(0, "", "", "empty file: no DXF group codes");
        }
        if (!r.type().equals("SECTION") && !(r.type().equals("ENDSEC") && r.indexOf(2) >= 0)) {
            throw in.error(r, "not a DXF file: expected '0 SECTION' at the start, got '0 " + r.type() + "'");
        }
        while (true) {
            if (r == null) {
                repaired(lastPosition, "the file ends without '0 EOF'; everything before it was read");
                break;
            }
            if (r.type().equals("EOF")) {
                break;
            }
            String name;
            if (r.type().equals("SECTION")) {
                name = r.str(2, "").trim();
            } else if (r.type().equals("ENDSEC") && r.indexOf(2) >= 0) {
                name = r.str(2, "").trim();
                repaired(r.position(), "'2 " + name + "' follows this '0 ENDSEC' without a '0 SECTION' before it;"
                        + " read as the start of the " + name + " section");
            } else if (r.type().equals("ENDSEC")) {
                repaired(r.position(), "'0 ENDSEC' outside any section; ignored");
                lastPosition = r.position();
                r = in.next();
                continue;
            } else {
                throw in.error(r, "expected '0 SECTION' or '0 EOF' between sections");
            }
            lastPosition = r.position();
            Record close = switch (name) {
                case "HEADER" -> readHeader(r);
                case "TABLES" -> readTables();
                case "BLOCKS" -> readBlocks();
                case "ENTITIES" -> readEntities();
                case "OBJECTS" -> readObjects();
                default -> skipSection(name);
            };
            if (ended) {
                break;
            }
            if (close != null) {
                lastPosition = close.position();
            }
            // a closing ENDSEC that carries a section name starts that section (its 0 SECTION was left out)
            r = close != null && close.indexOf(2) >= 0 ? close : in.next();
        }
        return build();
    }

    /**
     * Set when the input ended inside a section (a warning has said so): nothing more to read.
     * Section readers return their closing {@code 0 ENDSEC} record, or null when the input ended
     * or the section was closed by a record pushed back for the caller.
     */
    private boolean ended;

    /** Position of the last record read (for "the file ends after line N"). */
    private long lastPosition;

    /** A {@code warning} note about a structure defect that was repaired, naming the line. */
    private void repaired(long position, String message) {
        String where = src.binary() ? "at byte " + position : "at line " + position;
        notes.add(Notes.of("warning", STRUCTURE_REPAIRED, file, (int) Math.min(position, Integer.MAX_VALUE), "", "", "",
                "file structure repaired " + where + ": " + message));
    }

    /** Note kind of a repaired structure defect. */
    static final String STRUCTURE_REPAIRED = "structure_repaired";

    /**
     * Reads HEADER: its variables are the groups of the SECTION record. Repaired with a warning:
     * a stray {@code 0 ENDSEC} followed by more variables (they are read too), a HEADER closed by
     * the next {@code 0 SECTION} or by the end of the file.
     */
    private Record readHeader(Record r) throws ReadException, IOException {
        if (r.hasBadValue()) {
            throw src.error(r.badPosition(), "HEADER", "", "value of group code " + r.badCode()
                    + " is not a number: '" + r.badText() + "'");
        }
        header = HeaderData.read(r);
        applyCodePage();
        while (true) {
            long pos = r.position();
            Record n = in.next();
            if (n == null || n.type().equals("EOF")) {
                repaired(pos, "the file ends inside the HEADER section (no '0 ENDSEC'); nothing follows it");
                ended = true;
                return null;
            }
            if (n.type().equals("SECTION")) {
                repaired(n.position(), "the HEADER section is not closed before this '0 SECTION'; closed it here");
                in.pushBack();
                return null;
            }
            if (!n.type().equals("ENDSEC")) {
                throw in.error(n, "expected '0 ENDSEC' to close the HEADER section");
            }
            if (n.indexOf(9) < 0) {
                return n;
            }
            if (n.hasBadValue()) {
                throw src.error(n.badPosition(), "HEADER", "", "value of group code " + n.badCode()
                        + " is not a number: '" + n.badText() + "'");
            }
            repaired(n.position(), "a '0 ENDSEC' inside the HEADER section is followed by more header variables;"
                    + " read them as part of HEADER");
            header = header.then(HeaderData.read(n));
            applyCodePage();
            r = n;
        }
    }

    private void applyCodePage() {
        if (header.utf8()) {
            src.charset(StandardCharsets.UTF_8);
        } else if (!header.codePage().isEmpty()) {
            CodePages.of(header.codePage()).ifPresent(src::charset);
        }
    }

    /**
     * The next record of a section, or null when the input ends inside it ({@code 0 EOF} or the
     * end of the file before {@code 0 ENDSEC}): a warning names the line and says what was read.
     */
    private Record nextInSection(String section, long lastPos, String lastType, String lastHandle)
            throws ReadException, IOException {
        return nextInSection(section, lastPos, lastType, lastHandle, -1);
    }

    /**
     * As above with the last record's handle as text, or when that is null as its value (so the
     * entity loops keep no handle string per record).
     */
    private Record nextInSection(String section, long lastPos, String lastType, String lastHandle,
            long lastHandleValue) throws ReadException, IOException {
        Record r = in.next();
        if (r == null || r.type().equals("EOF")) {
            ended = true;
        }
        if (r == null) {
            repaired(lastPos, "the file ends inside the " + section + " section (no '0 ENDSEC', no '0 EOF');"
                    + " the section was read up to there");
            return null;
        }
        if (r.type().equals("EOF")) {
            repaired(r.position(), "'0 EOF' inside the " + section + " section (no '0 ENDSEC' before it); the"
                    + " section was closed there");
            return null;
        }
        return r;
    }

    private Record skipSection(String name) throws ReadException, IOException {
        long pos = lastPosition;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection(name.isEmpty() ? "unnamed" : name, pos, type, handle);
            if (r == null) {
                return null;
            }
            if (r.type().equals("ENDSEC")) {
                return r;
            }
            pos = r.position();
            type = r.type();
            handle = r.handle();
        }
    }

    private Record readTables() throws ReadException, IOException {
        String table = "";
        long pos = lastPosition;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection("TABLES", pos, type, handle);
            if (r == null) {
                return null;
            }
            switch (r.type()) {
                case "ENDSEC" -> {
                    return r;
                }
                case "TABLE" -> table = r.str(2, "").trim();
                case "ENDTAB" -> table = "";
                case "LAYER" -> {
                    if (table.equals("LAYER")) {
                        readLayer(r);
                    }
                }
                default -> {
                }
            }
            pos = r.position();
            type = r.type();
            handle = r.handle();
        }
    }

    private void readLayer(Record r) throws ReadException {
        if (r.hasBadValue()) {
            throw src.error(r.badPosition(), "LAYER", r.handle(), "value of group code " + r.badCode()
                    + " is not a number: '" + r.badText() + "'");
        }
        String name = r.str(2, "");
        double colour = r.num(62, 7);
        double flags = r.num(70, 0);
        int c = (int) Math.max(Math.min(colour, Integer.MAX_VALUE), Integer.MIN_VALUE);
        layers.put(name, new Layer(name, colour >= 0, (((long) flags) & 1) != 0, c, true));
    }

    private Record readBlocks() throws ReadException, IOException {
        long pos = lastPosition;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection("BLOCKS", pos, type, handle);
            if (r == null) {
                return null;
            }
            if (r.type().equals("ENDSEC")) {
                return r;
            }
            if (r.type().equals("BLOCK")) {
                readBlock(r);
                if (ended) {
                    return null;
                }
                continue;
            }
            // stray records between blocks (ENDBLK without BLOCK, entities): ignored but counted
            if (!r.type().equals("ENDBLK")) {
                notes.add(Notes.of("warning", "stray_record", file, (int) Math.min(r.position(),
                        Integer.MAX_VALUE), r.type(), r.handle(), r.layer(), "record outside any BLOCK definition; ignored"));
            }
            pos = r.position();
            type = r.type();
            handle = r.handle();
        }
    }

    private void readBlock(Record r) throws ReadException, IOException {
        if (r.hasBadValue()) {
            throw src.error(r.badPosition(), "BLOCK", r.handle(), "value of group code " + r.badCode()
                    + " is not a number: '" + r.badText() + "'");
        }
        String name = r.str(2, "");
        Vec3 base = new Vec3(r.num(10, 0), r.num(20, 0), r.num(30, 0));
        if (!base.isFinite()) {
            throw in.error(r, "block '" + name + "' has a base point that is not finite: " + base);
        }
        String upper = name.toUpperCase(Locale.ROOT);
        BlockBuilder target;
        if (upper.startsWith("*PAPER_SPACE") || upper.startsWith("$PAPER_SPACE")) {
            target = null;
        } else if (upper.equals("*MODEL_SPACE") || upper.equals("$MODEL_SPACE")) {
            target = blocks.get(Drawing.MODEL_SPACE);
        } else if (blocks.containsKey(name)) {
            notes.add(Notes.of("warning", "duplicate_block", file, (int) Math.min(r.position(),
                    Integer.MAX_VALUE), "BLOCK", r.handle(), "", "block '" + name
                    + "' is defined again; the first definition is used"));
            target = new BlockBuilder(name, base);
        } else {
            target = new BlockBuilder(name, base);
            blocks.put(name, target);
        }
        long pos = r.position();
        String type = r.type();
        String handle = r.handle();
        long handleValue = -1;
        while (true) {
            Record e = nextInSection("BLOCKS", pos, type, handle, handleValue);
            if (e == null) {
                return;
            }
            if (e.type().equals("ENDBLK")) {
                return;
            }
            if (e.type().equals("ENDSEC") || e.type().equals("BLOCK")) {
                throw in.error(e, "expected '0 ENDBLK' to close block '" + name + "'");
            }
            pos = e.position();
            type = e.type();
            handleValue = e.handleValue();
            handle = e.numericHandle() ? null : e.handle();
            if (!cutOff(e)) {
                handler.handle(e, in, target);
            }
        }
    }

    /**
     * True (with an error note) for a record that the end of the input cut short: its groups may
     * be incomplete (a LINE without its end point), so it is not read; everything before it is.
     */
    private boolean cutOff(Record e) {
        if (!e.endOfInput()) {
            return false;
        }
        notes.add(Notes.of("error", "skipped_entity", file, (int) Math.min(e.position(), Integer.MAX_VALUE),
                e.type(), e.handle(), e.layer(), "the file ends inside this record, which may be cut off; not read"));
        return true;
    }

    private Record readEntities() throws ReadException, IOException {
        BlockBuilder model = blocks.get(Drawing.MODEL_SPACE);
        long pos = lastPosition;
        String type = "SECTION";
        String handle = "";
        long handleValue = -1;
        while (true) {
            Record e = nextInSection("ENTITIES", pos, type, handle, handleValue);
            if (e == null) {
                return null;
            }
            if (e.type().equals("ENDSEC")) {
                return e;
            }
            pos = e.position();
            type = e.type();
            handleValue = e.handleValue();
            handle = e.numericHandle() ? null : e.handle();
            if (!cutOff(e)) {
                handler.handle(e, in, e.num(67, 0) == 1 ? null : model);
            }
        }
    }

    /** MLINE styles of the OBJECTS section by upper-case handle and by upper-case name. */
    private final Map<String, MlineStyle> stylesByHandle = new HashMap<>();
    private final Map<String, MlineStyle> stylesByName = new HashMap<>();

    /**
     * The OBJECTS section: MLINESTYLE objects are kept for the MLINEs (a style that cannot be used
     * gets a warning, and its MLINEs keep their own element parameters); everything else is passed.
     */
    private Record readObjects() throws ReadException, IOException {
        long pos = lastPosition;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection("OBJECTS", pos, type, handle);
            if (r == null) {
                return null;
            }
            if (r.type().equals("ENDSEC")) {
                return r;
            }
            if (r.type().equals("MLINESTYLE") && options.mlinesAndLeaders()) {
                readMlineStyle(r);
            }
            pos = r.position();
            type = r.type();
            handle = r.handle();
        }
    }

    private void readMlineStyle(Record r) {
        int line = (int) Math.min(r.position(), Integer.MAX_VALUE);
        if (r.hasBadValue() || r.endOfInput()) {
            String why = r.hasBadValue() ? "value of group code " + r.badCode() + " is not a number: '" + r.badText()
                    + "'" : "the file ends inside this style, which may be cut off";
            notes.add(Notes.of("warning", "ignored_entity", file, line, r.type(), r.handle(), "", why
                    + "; the style was not read, and its MLINEs keep their own element parameters"));
            return;
        }
        try {
            MlineStyle s = MlineStyle.read(r);
            if (!s.handle().isEmpty()) {
                stylesByHandle.putIfAbsent(s.handle().toUpperCase(Locale.ROOT), s);
            }
            stylesByName.putIfAbsent(s.name().toUpperCase(Locale.ROOT), s);
        } catch (EntitySkip e) {
            notes.add(Notes.of("warning", "ignored_entity", file, line, r.type(), r.handle(), "", e.getMessage()
                    + "; the style was not read, and its MLINEs keep their own element parameters"));
        }
    }

    private Drawing build() {
        handler.finishMlines(stylesByHandle, stylesByName);
        List<BlockBuilder> list = new ArrayList<>(blocks.values());
        new InsertResolver(file, options.maxBlockDepth(), notes).resolve(list);
        Map<String, Block> built = new HashMap<>();
        for (BlockBuilder b : list) {
            built.put(b.name, b.build());
        }
        Map<String, Layer> allLayers = new HashMap<>(layers);
        for (String name : handler.usedLayers) {
            allLayers.computeIfAbsent(name, Layer::undefined);
        }
        UnitChoice u = UnitChoice.of(header, options, file);
        u.note().ifPresent(n -> notes.add(0, n));
        paperSpaceNote().ifPresent(notes::add);
        invisibleNote().ifPresent(notes::add);
        NotWeighed.notes(file, blocks, built, notes);
        if (!handler.draftingLeftOut.isEmpty()) {
            StringBuilder t = new StringBuilder();
            handler.draftingLeftOut.forEach((k, v) -> t.append(t.length() == 0 ? "" : ", ").append(v).append(' ').append(k));
            notes.add(Notes.of("info", "ignored_entity", file, 0, "", "", "", t + " (drafting: double lines, arrows to"
                    + " notes) not read as wire; --mlines-and-leaders reads MLINE element lines and LEADER paths too"));
        }
        return new Drawing(file, header.acadVer(), src.binary(), u.unit(), u.source(), allLayers, built,
                handler.paperSpaceEntities, notes);
    }

    /** What happened to paper space: left out (with the option that reads it) or read into model space. */
    private java.util.Optional<ImportNote> paperSpaceNote() {
        if (handler.paperSpaceRead > 0) {
            return java.util.Optional.of(Notes.of("warning", "paper_space_read", file, 0, "", "", "",
                    handler.paperSpaceRead + " paper-space entities were read into model space as asked; paper space "
                            + "is drawn at the sheet's scale, so check that their units match the model's"));
        }
        if (handler.paperSpaceEntities > 0) {
            return java.util.Optional.of(Notes.of("info", "ignored_entity", file, 0, "", "", "",
                    handler.paperSpaceEntities + " entities in paper space were not read (only model space counts; "
                            + "--paper-space reads them too)"));
        }
        return java.util.Optional.empty();
    }

    /** How many invisible entities (group 60 = 1) were left out, per type, and the option that reads them. */
    private java.util.Optional<ImportNote> invisibleNote() {
        if (handler.invisible.isEmpty()) {
            return java.util.Optional.empty();
        }
        long total = 0;
        StringBuilder types = new StringBuilder();
        for (Map.Entry<String, Integer> e : handler.invisible.entrySet()) {
            total += e.getValue();
            types.append(types.length() == 0 ? "" : ", ").append(e.getKey()).append(' ').append(e.getValue());
        }
        return java.util.Optional.of(Notes.of("info", "ignored_entity", file, 0, "", "", "", total
                + " invisible entities (group code 60 = 1: " + types + ") were not read; no CAD program draws them"
                + " (--invisible reads them too)"));
    }

    /** The unit, where it came from, and the note that says it was guessed. */
    record UnitChoice(LengthUnit unit, UnitSource source, java.util.Optional<ImportNote> note) {

        static UnitChoice of(HeaderData h, ReadSettings o, String file) {
            if (o.unitOverride().isPresent()) {
                return new UnitChoice(o.unitOverride().get(), UnitSource.OPTION, java.util.Optional.empty());
            }
            var fromHeader = h.insunits() > 0 ? LengthUnit.fromInsunits(h.insunits())
                    : java.util.Optional.<LengthUnit>empty();
            if (fromHeader.isPresent()) {
                return new UnitChoice(fromHeader.get(), UnitSource.HEADER, java.util.Optional.empty());
            }
            LengthUnit guess = h.measurement() == 0 ? LengthUnit.INCH : LengthUnit.MILLIMETRE;
            String why = h.insunits() < 0 ? "no $INSUNITS" : h.insunits() == 0 ? "$INSUNITS is 0 (unitless)"
                    : "$INSUNITS " + h.insunits() + " is not a known unit code";
            String hint = h.measurement() < 0 ? "no $MEASUREMENT either, so the metric default"
                    : "$MEASUREMENT " + h.measurement() + (h.measurement() == 0 ? " (imperial)" : " (metric)");
            String msg = "drawing units not given (" + why + "); assumed " + guess.symbol() + " (" + hint
                    + "); give the units with --units to be sure";
            return new UnitChoice(guess, UnitSource.ASSUMED,
                    java.util.Optional.of(Notes.of("warning", "units_assumed", file, 0, "", "", "", msg)));
        }
    }
}
