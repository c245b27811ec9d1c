package org.lpzplanner.cli;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.locationtech.jts.geom.Coordinate;

/**
 * Reads a points file: UTF-8 CSV whose first line is the header {@code x,y}, then one point per
 * line as two numbers in the site's coordinates (longitude,latitude for lon/lat sites, else local
 * metres). Blank lines are skipped. Problems are reported with the file name and 1-based line
 * number.
 */
final class PointsCsv {

    /**
     * Points farther than this from the site's centre (metres) are taken for a coordinate mix-up:
     * sites span at most 20 km.
     */
    static final double MAX_DISTANCE = 50_000;

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    /**
     * One point as given and in local metres.
     *
     * @param x     the first value exactly as written (trimmed), echoed in output
     * @param y     the second value exactly as written (trimmed)
     * @param local the point in local metres
     */
    record Point(String x, String y, Coordinate local) {}

    private PointsCsv() {
    }

    /**
     * Reads every point.
     *
     * @param centre the site's centre in local metres, to catch points given in the wrong coordinates
     * @throws CliException when the file cannot be read or a line is not a valid point
     */
    static List<Point> read(Path file, SiteFrame frame, Coordinate centre) {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        List<String> lines = lines(file, name);
        if (lines.isEmpty() || !header(lines.get(0))) {
            throw new CliException(name + ", line 1: the first line must be the header x,y");
        }
        List<Point> points = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            if (!lines.get(i).isBlank()) {
                points.add(point(lines.get(i), frame, centre, name + ", line " + (i + 1)));
            }
        }
        if (points.isEmpty()) {
            throw new CliException(name + ": no points after the header x,y");
        }
        return points;
    }

    private static boolean header(String line) {
        String[] cells = line.replace("\uFEFF", "").split(",", -1);
        return cells.length == 2 && cells[0].trim().equalsIgnoreCase("x") && cells[1].trim().equalsIgnoreCase("y");
    }

    private static Point point(String line, SiteFrame frame, Coordinate centre, String where) {
        String[] cells = line.split(",", -1);
        if (cells.length != 2) {
            throw new CliException(where + ": expected two values x,y, got " + cells.length + ": \"" + line.strip() + "\"");
        }
        String x = cells[0].trim();
        String y = cells[1].trim();
        for (String v : new String[] {x, y}) {
            if (!DECIMAL.matcher(v).matches()) {
                throw new CliException(where + ": \"" + v + "\" is not a number");
            }
        }
        Coordinate local;
        try {
            local = frame.toLocal(Double.parseDouble(x), Double.parseDouble(y));
        } catch (IllegalArgumentException e) {
            throw new CliException(where + ": " + x + "," + y + " is not a usable longitude,latitude: " + e.getMessage(), e);
        }
        if (local.distance(centre) > MAX_DISTANCE) {
            throw new CliException(where + ": " + x + "," + y + " lies more than " + (int) (MAX_DISTANCE / 1000)
                    + " km from the site; give " + (frame.lonLat() ? "longitude,latitude" : "local metres")
                    + " like the site file");
        }
        return new Point(x, y, local);
    }

    private static List<String> lines(Path file, String name) {
        try {
            return Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            throw new CliException(name + ": the file is not UTF-8 text", e);
        } catch (IOException e) {
            throw new CliException(name + ": cannot be read: " + e.getMessage(), e);
        }
    }
}
