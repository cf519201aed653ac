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
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.importer.read.GroupSource;
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
    private final ImportOptions options;
    private final String file;
    private final List<ImportNote> notes = new ArrayList<>();
    private final Map<String, Layer> layers = new LinkedHashMap<>();
    private final Map<String, BlockBuilder> blocks = new LinkedHashMap<>();
    private final EntityHandler handler;
    private final RecordStream in;
    private HeaderData header = HeaderData.NONE;

    private DrawingReader(GroupSource src, ImportOptions options) {
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
    public static Drawing read(GroupSource src, ImportOptions options) throws DxfInputException, IOException {
        return new DrawingReader(src, options).read();
    }

    private Drawing read() throws DxfInputException, IOException {
        Record r = in.next();
        if (r == null) {
            throw src.error(0, "", "", "empty file: no DXF group codes");
        }
        if (!r.type().equals("SECTION")) {
            throw in.error(r, "not a DXF file: expected '0 SECTION' at the start, got '0 " + r.type() + "'");
        }
        while (r != null) {
            if (r.type().equals("EOF")) {
                break;
            }
            if (!r.type().equals("SECTION")) {
                throw in.error(r, "expected '0 SECTION' or '0 EOF' between sections");
            }
            String name = r.str(2, "").trim();
            switch (name) {
                case "HEADER" -> readHeader(r);
                case "TABLES" -> readTables();
                case "BLOCKS" -> readBlocks();
                case "ENTITIES" -> readEntities();
                default -> skipSection(name);
            }
            r = in.next();
        }
        return build();
    }

    private void readHeader(Record r) throws DxfInputException, IOException {
        if (r.hasBadValue()) {
            throw src.error(r.badPosition(), "HEADER", "", "value of group code " + r.badCode()
                    + " is not a number: '" + r.badText() + "'");
        }
        header = HeaderData.read(r);
        if (header.utf8()) {
            src.charset(StandardCharsets.UTF_8);
        } else if (!header.codePage().isEmpty()) {
            CodePages.of(header.codePage()).ifPresent(src::charset);
        }
        expectEndsec("HEADER", r);
    }

    private void expectEndsec(String section, Record last) throws DxfInputException, IOException {
        long pos = last.position();
        String type = last.type();
        String handle = last.handle();
        Record r = in.next();
        if (r == null) {
            throw src.error(pos, type, handle, "file ends inside the " + section + " section (0 ENDSEC missing)");
        }
        if (!r.type().equals("ENDSEC")) {
            throw in.error(r, "expected '0 ENDSEC' to close the " + section + " section");
        }
    }

    private Record nextInSection(String section, long lastPos, String lastType, String lastHandle)
            throws DxfInputException, IOException {
        return nextInSection(section, lastPos, lastType, lastHandle, -1);
    }

    /**
     * As above with the last record's handle as text, or when that is null as its value (so the
     * entity loops keep no handle string per record).
     */
    private Record nextInSection(String section, long lastPos, String lastType, String lastHandle,
            long lastHandleValue) throws DxfInputException, IOException {
        Record r = in.next();
        if (r == null || r.type().equals("EOF")) {
            String handle = lastHandle != null ? lastHandle : Record.hexText(lastHandleValue);
            throw src.error(lastPos, lastType, handle, "file ends inside the " + section
                    + " section (0 ENDSEC missing)");
        }
        return r;
    }

    private void skipSection(String name) throws DxfInputException, IOException {
        long pos = 0;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection(name.isEmpty() ? "unnamed" : name, pos, type, handle);
            if (r.type().equals("ENDSEC")) {
                return;
            }
            pos = r.position();
            type = r.type();
            handle = r.handle();
        }
    }

    private void readTables() throws DxfInputException, IOException {
        String table = "";
        long pos = 0;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection("TABLES", pos, type, handle);
            switch (r.type()) {
                case "ENDSEC" -> {
                    return;
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

    private void readLayer(Record r) throws DxfInputException {
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

    private void readBlocks() throws DxfInputException, IOException {
        long pos = 0;
        String type = "SECTION";
        String handle = "";
        while (true) {
            Record r = nextInSection("BLOCKS", pos, type, handle);
            if (r.type().equals("ENDSEC")) {
                return;
            }
            if (r.type().equals("BLOCK")) {
                readBlock(r);
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

    private void readBlock(Record r) throws DxfInputException, IOException {
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
            handler.handle(e, in, target);
        }
    }

    private void readEntities() throws DxfInputException, IOException {
        BlockBuilder model = blocks.get(Drawing.MODEL_SPACE);
        long pos = 0;
        String type = "SECTION";
        String handle = "";
        long handleValue = -1;
        while (true) {
            Record e = nextInSection("ENTITIES", pos, type, handle, handleValue);
            if (e.type().equals("ENDSEC")) {
                return;
            }
            pos = e.position();
            type = e.type();
            handleValue = e.handleValue();
            handle = e.numericHandle() ? null : e.handle();
            handler.handle(e, in, e.num(67, 0) == 1 ? null : model);
        }
    }

    private Drawing build() {
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

        static UnitChoice of(HeaderData h, ImportOptions o, String file) {
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
