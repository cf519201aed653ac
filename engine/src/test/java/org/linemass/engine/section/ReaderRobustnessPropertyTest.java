package org.linemass.engine.section;

import java.io.StringReader;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.field.FieldExpression;

/**
 * Hostile input never escapes as anything but the project's error type: section tables, assignment
 * files, parametric ids and expressions built from random text of the characters that matter.
 */
class ReaderRobustnessPropertyTest {

    @Provide
    Arbitrary<String> csvText() {
        Arbitrary<String> cell = Arbitraries.oneOf(Arbitraries.of("section", "mass_kg_per_m", "shape", "d_mm", "od_mm",
                "wall_mm", "w_mm", "h_mm", "density_kg_m3", "material", "round", "tube", "flat", "steel", "-1", "0",
                "1e400", "NaN", "2.5", "\"a,b\"", "\"", "", "#", "x"), Arbitraries.strings().ofMaxLength(4));
        Arbitrary<String> line = cell.list().ofMaxSize(8).map(l -> String.join(",", l));
        return line.list().ofMaxSize(6).map(l -> String.join("\n", l));
    }

    @Property(tries = 300)
    void sectionTable_failsOnlyWithAnalysisException(@ForAll("csvText") String text) {
        try {
            SectionTable t = SectionCsvReader.read(new StringReader(text), "fuzz.csv");
            t.rows().forEach(s -> {
                if (!(s.kgPerM() > 0) || !Double.isFinite(s.kgPerM())) {
                    throw new AssertionError("accepted a bad mass " + s);
                }
            });
        } catch (AnalysisException e) {
            if (!e.getMessage().startsWith("fuzz.csv")) {
                throw new AssertionError("message does not name the file: " + e.getMessage());
            }
        }
    }

    @Property(tries = 300)
    void assignments_failOnlyWithAnalysisException(@ForAll("csvText") String text) {
        try {
            AssignmentReader.read(new StringReader("layer,section\n" + text), "fuzz.csv");
        } catch (AnalysisException e) {
            if (!e.getMessage().startsWith("fuzz.csv")) {
                throw new AssertionError("message does not name the file: " + e.getMessage());
            }
        }
    }

    @Property(tries = 300)
    void parametricIds_failOnlyWithIllegalArgument(@ForAll("ids") String id) {
        try {
            ParametricSection.parse(id).ifPresent(s -> {
                if (!(s.kgPerM() > 0) || !Double.isFinite(s.kgPerM())) {
                    throw new AssertionError("accepted a bad section " + s);
                }
            });
        } catch (IllegalArgumentException e) {
            // expected for malformed ids
        }
    }

    @Provide
    Arbitrary<String> ids() {
        return Arbitraries.of("round", "tube", "rect", "flat", "square", "oval", "", "12", "42.4x2.6", "x", "0", "-3",
                "1e309", "NaN", "steel", "copper", "7850", "0x0", "3x", ":").list().ofMaxSize(4)
                .map(l -> String.join(":", l));
    }

    @Property(tries = 300)
    void expressions_failOnlyWithAnalysisException(@ForAll("expressions") String text) {
        try {
            FieldExpression.parse(text, "L", true);
        } catch (AnalysisException e) {
            // expected for malformed expressions
        }
    }

    @Provide
    Arbitrary<String> expressions() {
        return Arbitraries.of("x", "y", "z", "s", "q", "1", "2.5", "+", "-", "*", "/", "^", "(", ")", "sin(", "sqrt(",
                ",", "e", "pi", " ", "!", "%", "1e999").list().ofMaxSize(8).map(l -> String.join("", l));
    }
}
