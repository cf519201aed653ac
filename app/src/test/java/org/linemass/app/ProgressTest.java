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
}
