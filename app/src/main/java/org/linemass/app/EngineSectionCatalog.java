package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import org.linemass.engine.AnalysisException;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionTable;

/**
 * The engine's section data. Integration seam: the built-in table loader and the CSV readers are
 * written in the engine's section package; until they are connected here this catalogue has an
 * empty built-in table and refuses section files with a clear message. At merge the three bodies
 * become {@code BuiltInSections.table()}, {@code SectionCsvReader.read(csv)} and
 * {@code AssignmentReader.read(csv)} (package {@code org.linemass.engine.section}).
 */
public final class EngineSectionCatalog implements SectionCatalog {

    @Override
    public SectionTable builtIn() {
        return SectionTable.empty();
    }

    @Override
    public SectionTable readTable(Path csv) throws AnalysisException {
        throw new AnalysisException(csv + ": reading section tables is not available in this build");
    }

    @Override
    public List<LayerAssignment> readAssignments(Path csv) throws AnalysisException {
        throw new AnalysisException(csv + ": reading layer assignments is not available in this build");
    }
}
