package org.lpzplanner.cli;

import java.io.PrintStream;
import java.util.Set;

/** One sub-command of the command line. Implementations hold no state between runs. */
interface Command {

    /** The word that selects the command, e.g. {@code analyze}. */
    String name();

    /** The options the command accepts, each with its leading {@code --}. */
    Set<String> optionNames();

    /**
     * Runs the command and prints its normal output to {@code out}.
     *
     * @throws CliException when the options or input files are not usable
     */
    void run(CliOptions options, PrintStream out);
}
