package org.lpzplanner.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

/** One in-process run of the command line with both streams captured. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code;
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
                PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            code = CommandLine.run(args, o, e);
        }
        return new CliRun(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** The error stream's lines (no trailing empty line). */
    List<String> errLines() {
        return err.lines().toList();
    }

    /** The output's lines. */
    List<String> outLines() {
        return out.lines().toList();
    }
}
