package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionCsvReader;
import org.linemass.engine.section.SectionTable;

/** The engine's section data: the built-in table and the user's section and assignment CSV files. */
public final class EngineSectionCatalog implements SectionCatalog {

    @Override
    public SectionTable builtIn() {
        return BuiltInSections.table();
    }

    @Override
    public SectionTable readTable(Path csv) throws AnalysisException {
        return SectionCsvReader.read(csv);
    }

    @Override
    public List<LayerAssignment> readAssignments(Path csv) throws AnalysisException {
        return AssignmentReader.read(csv);
    }
}
