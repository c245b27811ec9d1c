package org.lpzplanner.cli;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * The options given to one command: {@code --name value} or {@code --name=value} pairs, each at
 * most once. Every accessor reports a problem as a {@link CliException} naming the option.
 */
final class CliOptions {

    // Plain decimal numbers only: Double.parseDouble would also take "NaN", "1d" or hex floats.
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final String command;
    private final Map<String, String> values;

    private CliOptions(String command, Map<String, String> values) {
        this.command = command;
        this.values = values;
    }

    /**
     * Parses the arguments after the command word.
     *
     * @param allowed the option names the command accepts, with their leading {@code --}
     * @throws CliException on an unknown or repeated option, a stray argument or a missing value
     */
    static CliOptions parse(String command, List<String> args, Set<String> allowed) {
        Map<String, String> values = new LinkedHashMap<>();
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if (!arg.startsWith("--")) {
                throw new CliException("unexpected argument \"" + arg + "\" for " + command
                        + "; options start with --, see --help");
            }
            int eq = arg.indexOf('=');
            String name = eq < 0 ? arg : arg.substring(0, eq);
            if (!allowed.contains(name)) {
                throw new CliException("unknown option " + name + " for " + command + "; see --help");
            }
            String value;
            if (eq >= 0) {
                value = arg.substring(eq + 1);
            } else if (i + 1 < args.size() && !args.get(i + 1).startsWith("--")) {
                value = args.get(++i);
            } else {
                throw new CliException("option " + name + " needs a value");
            }
            if (value.isBlank()) {
                throw new CliException("option " + name + " needs a value");
            }
            if (values.putIfAbsent(name, value) != null) {
                throw new CliException("option " + name + " is given more than once");
            }
        }
        return new CliOptions(command, values);
    }

    /** Whether the option was given. */
    boolean has(String name) {
        return values.containsKey(name);
    }

    /** The option's value, or null when it was not given. */
    String value(String name) {
        return values.get(name);
    }

    /**
     * The value of an option the command cannot do without.
     *
     * @param meaning what the value stands for in the message, e.g. "FILE"
     */
    String required(String name, String meaning) {
        String value = values.get(name);
        if (value == null) {
            throw new CliException(command + " needs " + name + " " + meaning + "; see --help");
        }
        return value;
    }

    /** The option's value as a decimal number, or null when it was not given. */
    Double decimal(String name) {
        String text = values.get(name);
        if (text == null) {
            return null;
        }
        if (!DECIMAL.matcher(text.trim()).matches()) {
            throw new CliException("option " + name + " must be a number of metres, got \"" + text + "\"");
        }
        return Double.parseDouble(text.trim());
    }

    /** An input file that must exist and be readable. */
    Path inputFile(String name, String meaning) {
        Path file = path(name, required(name, meaning));
        if (!Files.exists(file)) {
            throw new CliException(name + ": file not found: " + file);
        }
        if (!Files.isRegularFile(file) || !Files.isReadable(file)) {
            throw new CliException(name + ": not a readable file: " + file);
        }
        return file;
    }

    /**
     * An output file, or null when not given; checked before any work is done so that a long
     * analysis is not lost to a mistyped folder.
     */
    Path outputFile(String name) {
        String text = values.get(name);
        if (text == null) {
            return null;
        }
        Path file = path(name, text);
        Path parent = file.toAbsolutePath().getParent();
        if (Files.isDirectory(file)) {
            throw new CliException(name + ": " + file + " is a folder; give a file name");
        }
        if (parent != null && !Files.isDirectory(parent)) {
            throw new CliException(name + ": the folder of " + file + " does not exist");
        }
        return file;
    }

    private static Path path(String name, String text) {
        try {
            return Path.of(text);
        } catch (InvalidPathException e) {
            throw new CliException(name + ": not a valid file name: \"" + text + "\"", e);
        }
    }
}
