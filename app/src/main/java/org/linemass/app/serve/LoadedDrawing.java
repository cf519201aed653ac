package org.linemass.app.serve;

import java.util.concurrent.Future;
import org.linemass.drawing.Drawing;
import org.linemass.reports.Report;

/**
 * One drawing a page dropped: its name (shown, never used as a path), its bytes (for the marked-up
 * copy), the imported drawing once read (kept so a new section pick re-runs only the engine), and
 * its latest report or the one-line reason it was refused. Mutable; guarded by the owning
 * {@link Session}'s lock, except {@link #stage}, which the worker writes and the page polls.
 */
final class LoadedDrawing {

    /** Where a drawing is. */
    enum Status { WORKING, DONE, REFUSED, CANCELLED }

    final int id;
    final String name;
    final byte[] bytes;
    volatile String stage = "waiting for a free worker";
    Status status = Status.WORKING;
    Drawing drawing;
    Report report;
    String message;
    /** Counts new reports, so the page fetches a picture only when it changed. */
    int revision;
    Future<?> job;

    LoadedDrawing(int id, String name, byte[] bytes) {
        this.id = id;
        this.name = name;
        this.bytes = bytes;
    }
}
