package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.LengthUnit;
import org.linemass.geometry.Segment;

/**
 * Structure defects that writers really produce, each in a small hand-written drawing in
 * testdata/importer (README there): the drawing is read, with one {@code structure_repaired}
 * warning naming the line and what was repaired, and nothing skipped. Every file holds one
 * 3-4-5 LINE (in model space, or in block STAY for the file that ends after its ENTITIES name).
 */
class StructureRecoveryTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "structure_stray_endsec_in_header.dxf|METRE|file structure repaired at line 9: a '0 ENDSEC' inside the HEADER"
                + " section is followed by more header variables; read them as part of HEADER",
        "structure_header_not_closed.dxf|MILLIMETRE|file structure repaired at line 13: the HEADER section is not"
                + " closed before this '0 SECTION'; closed it here",
        "structure_entities_without_section.dxf|MILLIMETRE|file structure repaired at line 13: '2 ENTITIES' follows"
                + " this '0 ENDSEC' without a '0 SECTION' before it; read as the start of the ENTITIES section",
        "structure_last_section_unterminated.dxf|MILLIMETRE|file structure repaired at line 41: the file ends inside"
                + " the OBJECTS section (no '0 ENDSEC', no '0 EOF'); the section was read up to there",
        "structure_ends_after_entities_name.dxf|MILLIMETRE|file structure repaired at line 49: the file ends inside"
                + " the ENTITIES section (no '0 ENDSEC', no '0 EOF'); the section was read up to there",
        "structure_no_eof.dxf|MILLIMETRE|file structure repaired at line 35: the file ends without '0 EOF';"
                + " everything before it was read"})
    void isReadWithAWarningNamingTheLine(String file, LengthUnit unit, String warning) throws Exception {
        Drawing d = DxfImporter.read(SharedFiles.testdata().resolve(file), ImportOptions.DEFAULTS);
        assertEquals(List.of(warning), d.notes().stream().filter(n -> n.kind().equals("structure_repaired"))
                .map(ImportNote::message).toList());
        assertEquals(List.of(), d.notes().stream().filter(n -> n.severity().equals("error")).toList());
        // the units come from the part of HEADER after a stray ENDSEC too
        assertEquals(unit, d.unit());
        List<Segment> segs = file.contains("ends_after_entities") ? d.blocks().get("STAY").segments()
                : d.modelSpace().segments();
        assertEquals(1, segs.size());
        // the 3-4-5 line (Pythagoras), exact in binary floating point
        assertEquals(5.0, LineIntegrals.of(segs).length, 0.0);
    }
}
