package org.lpzplanner.cli;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;

/**
 * The command-line entry point: picks the command named by the first argument, runs it and turns
 * every outcome into an exit code. Plain Java; starts no web server or application context.
 *
 * <p>Exit codes: {@value #OK} when the command ran (or help was asked for); {@value #INVALID} for
 * an unknown command or option, a missing or invalid value, or an unusable input file, with a
 * one-line message starting {@code error: } on the error stream; {@value #FAILED} when the
 * analysis itself failed unexpectedly, also with a one-line message. No stack trace is printed.
 */
public final class CommandLine {

    public static final int OK = 0;
    public static final int FAILED = 1;
    public static final int INVALID = 2;

    /** Asks for help anywhere in the arguments. */
    private static final Set<String> HELP_OPTIONS = Set.of("--help", "-h");

    /** Asks for help as the first argument only (elsewhere it could be a file name). */
    private static final String HELP_COMMAND = "help";

    private static final Map<String, Command> COMMANDS = commands(new AnalyzeCommand(), new EnvelopeCommand(),
            new ReportCommand());

    static final String USAGE = String.join(System.lineSeparator(),
            "Usage:",
            "  java -jar lpz-planner.jar analyze  --site FILE --level LEVEL [--radius M] [--resolution M] [--out FILE]",
            "  java -jar lpz-planner.jar envelope --site FILE --level LEVEL [--radius M] [--resolution M] --points FILE",
            "  java -jar lpz-planner.jar report   --site FILE --level LEVEL [--parts FILE] [--radius M] [--resolution M]",
            "                                     [--address TEXT] [--designer TEXT] --out FILE",
            "  java -jar lpz-planner.jar --help",
            "",
            "Assesses a site for direct lightning strikes with the rolling sphere method (IEC 62305-3:2010).",
            "",
            "Commands:",
            "  analyze    print the exposed roof areas, edges, corners and facade bands, which",
            "             air-termination parts intercept, and the protected ground; with --out,",
            "             also write these results as GeoJSON",
            "  envelope   print, as CSV x,y,envelope_m, the height of the protection envelope above",
            "             ground at each point of a CSV file",
            "  report     write the printed assessment (PDF): plan to scale, sections, schedules,",
            "             cautions and a review block for the licensed reviewer",
            "",
            "Options:",
            "  --site FILE        site file: GeoJSON (.geojson, .json) or WKT (.wkt, .txt);",
            "                     see docs/site-format.md",
            "  --level LEVEL      protection level I, II, III or IV (sphere radius 20, 30, 45 or 60 m)",
            "  --radius M         roll a sphere of this radius in metres instead of the level's",
            "  --resolution M     grid spacing in metres, 0.05 to 10 (default: chosen from the site's size)",
            "  --out FILE         analyze: also write the results as GeoJSON to FILE; report: the PDF",
            "  --parts FILE       report: GeoJSON of rod and conductor features added to the site's own",
            "  --address TEXT     report: the site's address for the cover (one line, at most 200",
            "                     characters; quote it); without it the cover keeps a line to fill in",
            "  --designer TEXT    report: the designer's name for the cover, likewise",
            "  --points FILE      envelope: CSV with the header line x,y and one point per line, in the",
            "                     site file's coordinates (longitude,latitude or local metres)",
            "  --help             print this text",
            "",
            "Exit codes: 0 done; 1 the analysis failed; 2 invalid command, option or input file.");

    private CommandLine() {
    }

    /**
     * Whether the command line (rather than the web application) should handle arguments that start
     * with this word: a command name or a request for help.
     */
    public static boolean handles(String firstArgument) {
        return firstArgument != null && (COMMANDS.containsKey(firstArgument)
                || HELP_OPTIONS.contains(firstArgument) || HELP_COMMAND.equals(firstArgument));
    }

    /**
     * Runs one command.
     *
     * @param args the arguments, command word first
     * @param out  where results and help go
     * @param err  where error messages (and usage after a missing command) go
     * @return the exit code: {@value #OK}, {@value #FAILED} or {@value #INVALID}
     */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        List<String> list = args == null ? List.of() : Arrays.asList(args);
        if (list.isEmpty()) {
            err.println(USAGE);
            return INVALID;
        }
        if (HELP_COMMAND.equals(list.get(0)) || list.stream().anyMatch(HELP_OPTIONS::contains)) {
            out.println(USAGE);
            return OK;
        }
        Command command = COMMANDS.get(list.get(0));
        if (command == null) {
            return error(err, "unknown command \"" + list.get(0) + "\"; the commands are "
                    + String.join(" and ", COMMANDS.keySet()) + "; see --help", INVALID);
        }
        try {
            CliOptions options = CliOptions.parse(command.name(), list.subList(1, list.size()), command.optionNames());
            command.run(options, out);
            out.flush();
            return OK;
        } catch (CliException e) {
            return error(err, e.getMessage(), INVALID);
        } catch (AnalysisTooLargeException e) {
            return error(err, e.getMessage(), INVALID);
        } catch (OutOfMemoryError e) {
            return error(err, "the analysis ran out of memory; try a coarser --resolution, or give Java more"
                    + " memory (for example java -Xmx4g -jar ...)", FAILED);
        } catch (RuntimeException e) {
            // An engine failure is not the user's doing: say so in one line, without a stack trace.
            String detail = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            return error(err, "the analysis failed: " + detail, FAILED);
        }
    }

    private static int error(PrintStream err, String message, int code) {
        // Messages may quote file content; keep them to one line whatever they hold.
        err.println("error: " + message.replaceAll("\\s*[\\r\\n]+\\s*", " ").strip());
        err.flush();
        return code;
    }

    private static Map<String, Command> commands(Command... commands) {
        Map<String, Command> map = new LinkedHashMap<>();
        for (Command c : commands) {
            map.put(c.name(), c);
        }
        return map;
    }
}
