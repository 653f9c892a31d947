package org.cellwright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

import picocli.CommandLine;

/** Runs the command line in-process and keeps what it printed (exit code, standard output and error). */
record CliRun(int code, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
