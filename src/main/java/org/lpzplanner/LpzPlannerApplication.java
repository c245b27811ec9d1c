package org.lpzplanner;

import org.lpzplanner.cli.CommandLine;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

/**
 * Starts LPZ Planner. With a command-line command first ({@code analyze}, {@code envelope}, or a
 * request for help) it runs that command and exits with its code, without starting Spring: a
 * one-off assessment needs no server or application context. Any other arguments start the
 * application as usual.
 */
@SpringBootApplication
public class LpzPlannerApplication {

    public static void main(String[] args) {
        if (args.length > 0 && CommandLine.handles(args[0])) {
            System.exit(CommandLine.run(args, System.out, System.err));
        }
        SpringApplication.run(LpzPlannerApplication.class, args);
    }
}
