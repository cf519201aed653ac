package org.linemass.app;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.io.OutputStreamWriter;
import java.io.FileOutputStream;
import java.io.FileDescriptor;

/**
 * What the commands talk to: output and error writers, the analysis pipeline, the section data,
 * the field integrator, and whether the session is interactive ({@code terminal}: colour on stdout
 * and a progress bar on stderr are allowed).
 */
public record AppContext(PrintWriter out, PrintWriter err, DrawingPipeline pipeline, SectionCatalog sections,
        FieldIntegrator integrator, boolean terminal) {

    /** The real thing: standard streams (UTF-8), the engine, and the terminal check {@code System.console() != null}. */
    public static AppContext system() {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(new FileOutputStream(FileDescriptor.out),
                StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(new FileOutputStream(FileDescriptor.err),
                StandardCharsets.UTF_8), true);
        return new AppContext(out, err, new EnginePipeline(), new EngineSectionCatalog(), new EngineFieldIntegrator(),
                System.console() != null);
    }

    public AppContext withPipeline(DrawingPipeline p) {
        return new AppContext(out, err, p, sections, integrator, terminal);
    }
}
