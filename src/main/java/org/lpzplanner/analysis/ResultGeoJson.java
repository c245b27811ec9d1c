package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The stored form of one analysis: a GeoJSON FeatureCollection in the site's local metres (x east,
 * y north), coordinates rounded to the centimetre. Top-level members {@code coordinates}
 * ({@code "local-metres"}), {@code method}, {@code level}, {@code radius} and {@code resolution}
 * describe it; every feature has a {@code layer} property, one of {@link #LAYERS}:
 *
 * <ul>
 *   <li>{@code structure}: footprint, {@code name}, {@code height} (top of the structure);</li>
 *   <li>{@code rooftop-object}: footprint, {@code name}, {@code top};</li>
 *   <li>{@code exposed-roof}: the part of a roof face a sphere reaches, {@code owner}, {@code area};</li>
 *   <li>{@code exposed-edge}: {@code owner}, {@code kind}, {@code length}, {@code top} (highest
 *       elevation along it);</li>
 *   <li>{@code exposed-corner}: a point, {@code owner}, {@code top} (its elevation);</li>
 *   <li>{@code facade-band}: along a wall, {@code owner}, {@code length}, {@code bottom}, {@code top};</li>
 *   <li>{@code protected-ground}: open ground no sphere reaches (LPZ 0B at ground level), {@code area};</li>
 *   <li>{@code rod} and {@code conductor}: air-termination parts, {@code id}, {@code name},
 *       {@code intercepts}; a rod also its {@code height} above what it stands on.</li>
 * </ul>
 */
public final class ResultGeoJson {

    /** The name of the method, as written in results. */
    public static final String METHOD = "rolling sphere method";

    public static final List<String> LAYERS = List.of("structure", "rooftop-object", "protected-ground",
            "exposed-roof", "facade-band", "exposed-edge", "exposed-corner", "rod", "conductor");

    private static final JsonMapper JSON = JsonMapper.builder().build();

    private ResultGeoJson() {
    }

    /** The result of analysing {@code site} as compact GeoJSON text. */
    public static String write(Site site, AnalysisResult result) {
        ObjectNode root = JSON.createObjectNode();
        root.put("type", "FeatureCollection");
        root.put("coordinates", "local-metres");
        root.put("name", site.name());
        root.put("method", METHOD);
        root.put("level", result.sphere().level().name());
        root.put("radius", round(result.sphere().radius()));
        root.put("resolution", round(result.resolution()));
        ArrayNode features = root.putArray("features");
        for (Structure s : site.structures()) {
            ObjectNode f = feature(features, "structure", polygonal(s.footprint()));
            f.put("id", s.id());
            f.put("name", s.name());
            f.put("height", round(s.topHeight()));
        }
        for (RooftopObject o : site.rooftopObjects()) {
            ObjectNode f = feature(features, "rooftop-object", polygonal(o.footprint()));
            f.put("id", o.id());
            f.put("name", o.name());
            f.put("top", round(o.top()));
        }
        Geometry ground = result.protectedGround().area();
        if (ground != null && !ground.isEmpty()) {
            feature(features, "protected-ground", polygonal(ground)).put("area", round(result.protectedGround().planArea()));
        }
        for (RoofExposure r : result.roofs()) {
            if (r.isExposed() && r.exposed() != null && !r.exposed().isEmpty()) {
                ObjectNode f = feature(features, "exposed-roof", polygonal(r.exposed()));
                f.put("owner", r.ownerName());
                f.put("area", round(r.exposedPlanArea()));
            }
        }
        for (FacadeBand b : result.facades()) {
            ObjectNode f = feature(features, "facade-band", line(b.line()));
            f.put("owner", b.ownerName());
            f.put("length", round(b.length()));
            f.put("bottom", round(b.bottom()));
            f.put("top", round(b.top()));
        }
        for (EdgeExposure e : result.edges()) {
            ObjectNode f = feature(features, "exposed-edge", line(e.line()));
            f.put("owner", e.ownerName());
            f.put("kind", e.kind().name().toLowerCase(Locale.ROOT).replace('_', '-'));
            f.put("length", round(e.length()));
            double top = Double.NEGATIVE_INFINITY;
            for (Coordinate c : e.line().getCoordinates()) {
                if (!Double.isNaN(c.getZ())) {
                    top = Math.max(top, c.getZ());
                }
            }
            if (Double.isFinite(top)) {
                f.put("top", round(top));
            }
        }
        for (CornerExposure c : result.corners()) {
            ObjectNode f = feature(features, "exposed-corner", point(c.point()));
            f.put("owner", c.ownerName());
            if (!Double.isNaN(c.point().getZ())) {
                f.put("top", round(c.point().getZ()));
            }
        }
        for (Rod rod : site.rods()) {
            ObjectNode f = feature(features, "rod", point(new Coordinate(rod.x(), rod.y())));
            f.put("id", rod.id());
            f.put("name", rod.name());
            f.put("height", round(rod.height()));
            f.put("intercepts", intercepts(result, rod.id()));
        }
        for (Conductor c : site.conductors()) {
            ObjectNode g = JSON.createObjectNode();
            g.put("type", "LineString");
            ArrayNode coordinates = g.putArray("coordinates");
            c.path().forEach(p -> coordinates.add(position(p)));
            ObjectNode f = feature(features, "conductor", g);
            f.put("id", c.id());
            f.put("name", c.name());
            f.put("intercepts", intercepts(result, c.id()));
        }
        return JSON.writeValueAsString(root);
    }

    private static boolean intercepts(AnalysisResult result, String partId) {
        return result.parts().stream().anyMatch(p -> p.partId().equals(partId) && p.intercepts());
    }

    /** Adds a feature and returns its properties object, {@code layer} already set. */
    private static ObjectNode feature(ArrayNode features, String layer, ObjectNode geometry) {
        ObjectNode f = features.addObject();
        f.put("type", "Feature");
        ObjectNode properties = f.putObject("properties");
        properties.put("layer", layer);
        f.set("geometry", geometry);
        return properties;
    }

    private static ObjectNode polygonal(Geometry geometry) {
        @SuppressWarnings("unchecked")
        List<Polygon> polygons = new ArrayList<>(PolygonExtracter.getPolygons(geometry));
        ObjectNode g = JSON.createObjectNode();
        g.put("type", "MultiPolygon");
        ArrayNode coordinates = g.putArray("coordinates");
        for (Polygon p : polygons) {
            ArrayNode rings = coordinates.addArray();
            rings.add(ring(p.getExteriorRing()));
            for (int i = 0; i < p.getNumInteriorRing(); i++) {
                rings.add(ring(p.getInteriorRingN(i)));
            }
        }
        return g;
    }

    private static ObjectNode line(LineString line) {
        ObjectNode g = JSON.createObjectNode();
        g.put("type", "LineString");
        g.set("coordinates", ring(line));
        return g;
    }

    private static ObjectNode point(Coordinate c) {
        ObjectNode g = JSON.createObjectNode();
        g.put("type", "Point");
        g.set("coordinates", position(c));
        return g;
    }

    private static ArrayNode ring(LineString line) {
        ArrayNode out = JSON.createArrayNode();
        for (Coordinate c : line.getCoordinates()) {
            out.add(position(c));
        }
        return out;
    }

    private static ArrayNode position(Coordinate c) {
        ArrayNode p = JSON.createArrayNode();
        p.add(round(c.x));
        p.add(round(c.y));
        return p;
    }

    static double round(double value) {
        return Math.round(value * 100) / 100.0;
    }
}
