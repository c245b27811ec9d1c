package org.lpzplanner.engine.io;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Reads the plain-text site format: one flat-roofed structure per line, written as a WKT POLYGON
 * or MULTIPOLYGON in local metres followed by its wall-top height, separated by white space or a
 * semicolon. Blank lines and lines starting with {@code #} are skipped. Structures are named
 * "Structure 1", "Structure 2", … with ids S1, S2, … in file order.
 */
final class WktSiteParser {

    private static final String EXAMPLE = "POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 12";

    private final String source;
    private final GeometryFactory factory = new GeometryFactory();
    private final FootprintCheck footprints = new FootprintCheck(null);

    WktSiteParser(String source) {
        this.source = source;
    }

    SiteDocument parse(String text) {
        List<Structure> structures = new ArrayList<>();
        List<SiteExtent.Part> parts = new ArrayList<>();
        java.util.Map<String, LinePlace> outlines = new java.util.HashMap<>();
        String[] lines = text.split("\\R", -1);
        long written = java.util.Arrays.stream(lines).map(String::strip)
                .filter(l -> !l.isEmpty() && !l.startsWith("#")).count();
        // one structure per line: the count is known before any line is read
        SiteSize.check(source, "lines", written, 0, 0);
        long vertices = 0;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            LinePlace place = new LinePlace(source, i + 1);
            int n = structures.size() + 1;
            Structure structure = structure(line, place, "S" + n, "Structure " + n);
            LinePlace earlier = outlines.putIfAbsent(structure.footprint().norm().toText(), place);
            if (earlier != null) {
                throw place.fail("geometry", "repeats the outline of " + earlier.label() + "; remove one of them");
            }
            structures.add(structure);
            vertices += structure.footprint().getNumPoints();
            SiteSize.check(source, "lines", structures.size(), 0, vertices);
            parts.add(new SiteExtent.Part(place, structure.footprint().getEnvelopeInternal()));
        }
        if (structures.isEmpty()) {
            throw new SiteFormatException(source, "the site has no structure; write one structure per line, e.g. "
                    + EXAMPLE);
        }
        SiteExtent.check(source, parts, "check for a stray coordinate or wrong units");
        return new SiteDocument(new Site(SiteReader.baseName(source), structures, List.of(), List.of(), List.of()),
                null, source);
    }

    private Structure structure(String line, LinePlace place, String id, String name) {
        int close = line.lastIndexOf(')');
        if (close < 0) {
            throw place.fail("geometry", "expected a WKT POLYGON or MULTIPOLYGON followed by the height in metres,"
                    + " e.g. " + EXAMPLE);
        }
        Geometry footprint = footprint(line.substring(0, close + 1), place);
        String rest = line.substring(close + 1).strip();
        if (rest.startsWith(";")) {
            rest = rest.substring(1).strip();
        }
        double height = height(rest, place);
        return new Structure(id, name, footprint, height, new RoofShape.Flat(0));
    }

    private Geometry footprint(String wkt, LinePlace place) {
        Geometry geometry;
        try {
            geometry = new WKTReader(factory).read(wkt);
        } catch (ParseException | IllegalArgumentException e) {
            throw place.fail("geometry", "is not readable WKT: " + e.getMessage());
        }
        if (!(geometry instanceof Polygonal)) {
            throw place.fail("geometry", "must be a POLYGON or MULTIPOLYGON, got " + geometry.getGeometryType()
                    .toUpperCase(java.util.Locale.ROOT));
        }
        if (geometry.isEmpty()) {
            throw place.fail("geometry", "is empty; give the outline's corners");
        }
        footprints.requireValid(geometry, place, "the footprint");
        footprints.requireStructureSize(geometry, place);
        return geometry;
    }

    private static double height(String text, LinePlace place) {
        if (text.isEmpty()) {
            throw place.fail("height", "is missing: put the wall-top height in metres after the geometry, e.g. "
                    + EXAMPLE);
        }
        double height;
        try {
            height = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw place.fail("height", "must be a number > 0, got " + Texts.quoted(text));
        }
        if (!Double.isFinite(height) || height <= 0) {
            throw place.fail("height", "must be a number > 0, got " + Texts.quoted(text));
        }
        if (height < SiteLimits.MIN_LENGTH) {
            throw place.fail("height", "must be at least " + Texts.metres(SiteLimits.MIN_LENGTH) + " m, got " + text
                    + "; values are metres, so check the units");
        }
        if (height > SiteLimits.MAX_HEIGHT) {
            throw place.fail("height", "must be at most " + Texts.metres(SiteLimits.MAX_HEIGHT) + " m, got " + text
                    + "; values are metres, so check the units");
        }
        return height;
    }
}
