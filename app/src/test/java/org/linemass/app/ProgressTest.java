package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class ProgressTest {

    @Test
    void progress_notInteractive_printsNothing() throws InterruptedException {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 2, false)) {
            Thread.sleep(Progress.DELAY_MS + 200);
            p.step("a.dxf");
        }
        assertEquals("", err.toString());
    }

    @Test
    void progress_quickWork_printsNothing() {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 2, true)) {
            p.step("a.dxf");
            p.step("b.dxf");
        }
        assertEquals("", err.toString());
    }

    @Test
    void progress_slowInteractiveWork_showsBarOnStderr() throws InterruptedException {
        StringWriter err = new StringWriter();
        try (Progress p = new Progress(new PrintWriter(err), 3, true)) {
            p.step("a.dxf");
            Thread.sleep(Progress.DELAY_MS + 500);
            p.step("b.dxf");
        }
        assertTrue(err.toString().contains("weighing"), err.toString());
    }

    @Test
    void message_namesTheDrawingRunningLongest() {
        long[] now = {0};
        try (Progress p = new Progress(new PrintWriter(new StringWriter()), 3, false, () -> now[0])) {
            p.started(0, "a.dxf");
            now[0] = 1_000_000_000L;
            p.started(1, "b.dxf");
            now[0] = 5_500_000_000L;
            assertEquals("2 running, longest a.dxf (5 s)", p.message());
            p.finished(0);
            assertEquals("1 running, longest b.dxf (4 s)", p.message());
            p.finished(1);
            assertEquals("b.dxf", p.message(), "the last one done when none runs");
        }
    }
}
