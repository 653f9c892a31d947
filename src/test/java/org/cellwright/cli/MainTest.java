package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.GraphicsEnvironment;
import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

class MainTest {

    /** Without a display, no arguments cannot open the window: one line saying so, the usage, exit 2. */
    @Test
    void noArgumentsWithoutADisplayExplainsAndExitsTwo() {
        assumeTrue(GraphicsEnvironment.isHeadless(), "this test is about a machine without a display");
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        assertEquals(Main.BAD_INPUT, cl.execute());
        String text = err.toString();
        assertTrue(text.startsWith("cellwright: there is no display to open the window on"), text);
        assertTrue(text.contains("Usage: cellwright"), text);
        assertEquals("", out.toString(), "nothing on standard output");
    }
}
