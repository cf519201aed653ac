package org.linemass.importer;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.linemass.drawing.Drawing;
import org.linemass.importer.parse.DrawingReader;
import org.linemass.importer.parse.ReadSettings;
import org.linemass.importer.read.AsciiGroupSource;
import org.linemass.importer.read.BinaryGroupSource;
import org.linemass.importer.read.ForeignFormat;
import org.linemass.importer.read.GroupSource;
import org.linemass.importer.read.ReadException;

/**
 * Reads one DXF file (ASCII or binary) into a {@link Drawing}. The file is opened read-only and
 * streamed in chunks, so memory follows the geometry, not the file text. Whatever the input, the
 * only exception that leaves these methods is {@link DxfInputException}: malformed structure is
 * reported with file, line (or byte offset for binary files), entity and handle; entities that
 * cannot be used are skipped with an error note in {@link Drawing#notes()}; unexpected internal
 * failures are reported as input errors asking for a report rather than escaping.
 *
 * <p>Provenance and note line numbers are DXF line numbers of an entity's {@code 0} group for
 * ASCII files and byte offsets of that group for binary files. Resource limits come from
 * {@link ImportOptions}: the longest text line (or binary string), the largest vertex and
 * spline point counts, and the deepest block nesting below model space; the per-record group
 * limit follows from the vertex limit. Inserts are never expanded here, so arrays and nested
 * blocks cost one definition each however many copies they place.
 */
public final class DxfImporter {

    private static final byte[] UTF8_BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private DxfImporter() {
    }

    /**
     * Reads {@code file} read-only.
     *
     * @throws DxfInputException when the file cannot be read as a drawing (one-line message with location)
     */
    public static Drawing read(Path file, ImportOptions options) throws DxfInputException {
        String name = file.toString();
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            byte[] head = new byte[BinaryGroupSource.sentinelLength()];
            ByteBuffer hb = ByteBuffer.wrap(head);
            while (hb.hasRemaining() && ch.read(hb) >= 0) {
                // keep reading until the head is full or the file ends
            }
            int got = hb.position();
            java.util.Optional<String> foreign = ForeignFormat.of(head, got);
            if (foreign.isPresent()) {
                throw new DxfInputException(name, 0, "", "", foreign.get());
            }
            GroupSource src;
            if (BinaryGroupSource.startsWithSentinel(head, got)) {
                ch.position(BinaryGroupSource.sentinelLength());
                src = BinaryGroupSource.of(name, ch, options.maxLineBytes());
            } else {
                ch.position(startsWithBom(head, got) ? UTF8_BOM.length : 0);
                src = AsciiGroupSource.of(name, ch, options.maxLineBytes());
            }
            return guarded(name, src, options);
        } catch (NoSuchFileException e) {
            throw new DxfInputException(name, 0, "", "", "file not found");
        } catch (IOException e) {
            throw new DxfInputException(name, 0, "", "", "cannot read the file: " + e.getMessage());
        }
    }

    /**
     * Reads a drawing held in memory (tests, fuzzing, uploads); {@code displayName} stands for the
     * file in messages and provenance.
     *
     * @throws DxfInputException when the content cannot be read as a drawing
     */
    public static Drawing read(String displayName, byte[] content, ImportOptions options) throws DxfInputException {
        java.util.Optional<String> foreign = ForeignFormat.of(content, content.length);
        if (foreign.isPresent()) {
            throw new DxfInputException(displayName, 0, "", "", foreign.get());
        }
        GroupSource src;
        if (BinaryGroupSource.startsWithSentinel(content, content.length)) {
            src = BinaryGroupSource.of(displayName, content, options.maxLineBytes());
        } else {
            src = AsciiGroupSource.of(displayName, content, startsWithBom(content, content.length) ? 3 : 0,
                    options.maxLineBytes());
        }
        return guarded(displayName, src, options);
    }

    private static Drawing guarded(String name, GroupSource src, ImportOptions options) throws DxfInputException {
        try {
            return DrawingReader.read(src, settings(options));
        } catch (ReadException e) {
            throw inputError(e);
        } catch (IOException e) {
            throw new DxfInputException(name, 0, "", "", "cannot read the file: " + e.getMessage());
        } catch (StackOverflowError | OutOfMemoryError e) {
            throw new DxfInputException(name, 0, "", "", "drawing too large or too deeply nested to read ("
                    + e.getClass().getSimpleName() + ")");
        } catch (RuntimeException e) {
            throw new DxfInputException(name, 0, "", "", "internal error while reading the drawing ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + "); please report this file");
        }
    }

    /** What the reading packages need of the options. */
    private static ReadSettings settings(ImportOptions o) {
        return new ReadSettings(o.unitOverride(), o.maxBlockDepth(), o.maxControlPoints(), o.maxVertices(),
                o.paperSpace(), o.invisible(), o.faceEdges(), o.mlinesAndLeaders());
    }

    /** The public input error for a reading failure: the same message, by line or by byte offset. */
    private static DxfInputException inputError(ReadException e) {
        if (e.binary()) {
            return DxfInputException.atByte(e.file(), e.position(), e.entityType(), e.handle(), e.problem());
        }
        return new DxfInputException(e.file(), (int) Math.min(e.position(), Integer.MAX_VALUE), e.entityType(),
                e.handle(), e.problem());
    }

    private static boolean startsWithBom(byte[] head, int length) {
        return length >= 3 && head[0] == UTF8_BOM[0] && head[1] == UTF8_BOM[1] && head[2] == UTF8_BOM[2];
    }
}
