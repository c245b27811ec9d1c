package org.lpzplanner.analysis;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.ModelWarning;
import org.lpzplanner.engine.exposure.PartInterception;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.exposure.SideFlashRule;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The one writer of analysis results as GeoJSON (RFC 7946 FeatureCollection), for the stored
 * revision, the JSON API and the command line's {@code analyze --out}.
 *
 * <p>{@link #write} gives the <em>stored form</em>: positions in the site's local metres (x east,
 * y north, rounded to the centimetre), flagged by the top-level {@code "coordinates":
 * "local-metres"}; for a site file in lon/lat it also holds {@code localOrigin} (longitude and
 * latitude of the local plane's origin, see {@link LocalProjection}). The plan drawing, the review
 * list and the report read this form. {@link #published} gives what the API and the command line
 * hand out: the same document in the site file's own coordinates, as site files are written (see
 * docs/site-format.md): WGS84 [longitude, latitude] when the site came in lon/lat (RFC 7946 §4,
 * no {@code coordinates} member), local metres only when the site came in local metres. A third
 * value of a position is always the elevation above the ground in metres (RFC 7946 §3.1.1 leaves
 * the meaning of altitude open; {@code analysis.elevations} says it).
 *
 * <p>Top level: {@code name}, {@code method}, {@code level}, {@code radius}, {@code resolution}
 * and {@code analysis} (site, source file, level, sphere radius, whether it is custom, resolution,
 * tolerance, method, standard, summary totals, times and the cautions). Every feature has a
 * {@code properties.layer}, one of {@link #LAYERS}:
 *
 * <ul>
 *   <li>{@code structure}: footprint, {@code id}, {@code name}, {@code height} (top of the structure);</li>
 *   <li>{@code rooftop-object}: footprint, {@code id}, {@code name}, {@code top};</li>
 *   <li>{@code protected-ground}: open ground no sphere reaches, {@code zone} (LPZ 0B), {@code area} m²;</li>
 *   <li>{@code exposed-roof}: the part of one roof face or rooftop-object top a sphere reaches,
 *       {@code owner}, {@code ownerId}, {@code surface} ({@code roof} or {@code rooftop-object}),
 *       {@code face} (1-based), {@code area} (exposed plan area) and {@code roofArea} (the face's), m²;</li>
 *   <li>{@code facade-band}: along the wall foot, {@code owner}, {@code ownerId}, {@code wall}
 *       (1-based), {@code length}, {@code bottom}, {@code top} (m above ground), {@code sideFlash}
 *       ({@link #SIDE_FLASH_LATERAL} or {@link #SIDE_FLASH_NEGLIGIBLE}, by {@link SideFlashRule},
 *       IEC 62305-3:2010 5.2.3), {@code sideFlashRule} (the rule in words) and {@code buildingHeight};
 *       a band that the rule splits is written as two features, one per part, with the same line;</li>
 *   <li>{@code exposed-edge}: with elevations, {@code owner}, {@code ownerId}, {@code kind},
 *       {@code length}, {@code top} (highest elevation along it);</li>
 *   <li>{@code exposed-corner}: a point with its elevation, {@code owner}, {@code ownerId}, {@code top};</li>
 *   <li>{@code rod}: its tip with elevation, {@code id}, {@code name}, {@code height} (above what it
 *       stands on), {@code intercepts};</li>
 *   <li>{@code conductor}: its path with elevations as placed, {@code id}, {@code name},
 *       {@code intercepts};</li>
 *   <li>{@code model-warning}: what the designer must know before relying on the result (a
 *       {@link ModelWarning}), as a MultiLineString in plan of the stretch concerned, {@code kind}
 *       ({@code free-span}: a conductor more than R above the surface beneath it), {@code part}
 *       (its id), {@code partName}, {@code heightAboveSurface} (the greatest, m), {@code radius}
 *       (the limit it exceeds, m) and {@code text}. The summary lists the same warnings; while any
 *       stands, {@code fullyProtected} is false.</li>
 * </ul>
 *
 * <p>Polygons are MultiPolygons, outer rings counter-clockwise. Areas are plan areas.
 */
public final class ResultGeoJson {

    /** The name of the method, as written in results. */
    public static final String METHOD = "rolling sphere method";

    /** The standard the method follows. */
    public static final String STANDARD = "IEC 62305-3:2010 rolling sphere method";

    /** What a position's third value means. */
    public static final String ELEVATIONS = "metres above ground";

    /** {@code sideFlash} of a facade band (or part of one) that needs lateral air-termination. */
    public static final String SIDE_FLASH_LATERAL = "lateral-air-termination";

    /** {@code sideFlash} of a facade band (or part of one) where flashes to the side are negligible. */
    public static final String SIDE_FLASH_NEGLIGIBLE = "negligible";

    /** The rule, with its clause, for a band that needs lateral air-termination. */
    public static final String LATERAL_RULE = "needs lateral air-termination (" + SideFlashRule.CLAUSE
            + ": the upper 20 % of a structure taller than 60 m, and everything above 120 m)";

    /** The rule, with its clause, for a band where flashes to the side are negligible. */
    public static final String NEGLIGIBLE_RULE = "flashes to the side negligible (" + SideFlashRule.CLAUSE
            + " and Annex A: a structure lower than 60 m, or below the upper 20 % of a taller one)";

    /** Every layer, in the order the plan draws them (bottom to top). */
    public static final List<String> LAYERS = List.of("structure", "rooftop-object", "protected-ground",
            "exposed-roof", "facade-band", "model-warning", "exposed-edge", "exposed-corner", "rod", "conductor");


    private ResultGeoJson() {
    }

    /** The stored form of an analysis of the site read from a file (see the class comment). */
    public static String write(SiteDocument document, AnalysisResult result) {
        return Json.MAPPER.writeValueAsString(collection(document.site(), document.projection(), document.sourceName(), result));
    }

    /** The stored form of an analysis of a site in local metres with no file behind it. */
    public static String write(Site site, AnalysisResult result) {
        return Json.MAPPER.writeValueAsString(collection(site, null, null, result));
    }

    /**
     * A stored result as the API and the command line hand it out: in lon/lat when it holds a
     * {@code localOrigin} (the site came in lon/lat), else as stored in local metres, flagged.
     * Longitudes and latitudes are rounded to 10⁻⁸ degree (about a millimetre).
     */
    public static ObjectNode published(String stored) {
        ObjectNode root = (ObjectNode) Json.MAPPER.readTree(stored);
        JsonNode origin = root.path("localOrigin");
        if (!origin.path("longitude").isNumber() || !origin.path("latitude").isNumber()) {
            return root;
        }
        LocalProjection projection = new LocalProjection(origin.path("longitude").asDouble(),
                origin.path("latitude").asDouble());
        root.remove("coordinates");
        for (JsonNode feature : root.path("features")) {
            toLonLat(feature.path("geometry").path("coordinates"), projection);
        }
        return root;
    }

    private static void toLonLat(JsonNode coordinates, LocalProjection projection) {
        if (!(coordinates instanceof ArrayNode array) || array.isEmpty()) {
            return;
        }
        if (array.get(0).isNumber()) {
            Coordinate lonLat = projection.toLonLat(array.get(0).asDouble(), array.get(1).asDouble());
            array.set(0, Json.MAPPER.getNodeFactory().numberNode(Math.round(lonLat.x * 1e8) / 1e8));
            array.set(1, Json.MAPPER.getNodeFactory().numberNode(Math.round(lonLat.y * 1e8) / 1e8));
            return;
        }
        array.forEach(child -> toLonLat(child, projection));
    }

    private static ObjectNode collection(Site site, LocalProjection projection, String sourceName,
            AnalysisResult result) {
        GeoJsonGeometry geometry = new GeoJsonGeometry();
        ObjectNode root = Json.MAPPER.createObjectNode();
        root.put("type", "FeatureCollection");
        root.put("coordinates", "local-metres");
        root.put("name", site.name());
        root.put("method", METHOD);
        root.put("level", result.sphere().level().name());
        root.put("radius", round(result.sphere().radius()));
        root.put("resolution", round(result.resolution()));
        if (projection != null) {
            ObjectNode origin = root.putObject("localOrigin");
            origin.put("longitude", projection.centreLon());
            origin.put("latitude", projection.centreLat());
        }
        root.set("analysis", analysis(site, sourceName, result));
        ArrayNode features = root.putArray("features");
        for (Structure s : site.structures()) {
            ObjectNode f = feature(features, "structure", geometry.multiPolygon(s.footprint()));
            f.put("id", s.id());
            f.put("name", s.name());
            f.put("height", round(s.topHeight()));
        }
        for (RooftopObject o : site.rooftopObjects()) {
            ObjectNode f = feature(features, "rooftop-object", geometry.multiPolygon(o.footprint()));
            f.put("id", o.id());
            f.put("name", o.name());
            f.put("top", round(o.top()));
        }
        Geometry ground = result.protectedGround().area();
        if (ground != null && !ground.isEmpty()) {
            ObjectNode f = feature(features, "protected-ground", geometry.multiPolygon(ground));
            f.put("zone", "LPZ 0B");
            f.put("area", round(result.protectedGround().planArea()));
        }
        for (RoofExposure r : result.roofs()) {
            if (r.isExposed() && r.exposed() != null && !r.exposed().isEmpty()) {
                ObjectNode f = feature(features, "exposed-roof", geometry.multiPolygon(r.exposed()));
                owner(f, r.ownerName(), r.ownerId());
                f.put("surface", r.kind() == SurfaceKind.ROOF ? "roof" : "rooftop-object");
                f.put("face", r.faceIndex() + 1);
                f.put("area", round(r.exposedPlanArea()));
                f.put("roofArea", round(r.planArea()));
            }
        }
        for (SideFlashRule.Part part : result.facadeParts()) {
            FacadeBand b = part.band();
            ObjectNode f = feature(features, "facade-band", geometry.lineString(b.line(), false));
            owner(f, b.ownerName(), b.ownerId());
            f.put("wall", b.wallIndex() + 1);
            f.put("length", round(b.length()));
            f.put("bottom", round(part.bottom()));
            f.put("top", round(part.top()));
            f.put("sideFlash", part.needsLateralAirTermination() ? SIDE_FLASH_LATERAL : SIDE_FLASH_NEGLIGIBLE);
            f.put("sideFlashRule", part.needsLateralAirTermination() ? LATERAL_RULE : NEGLIGIBLE_RULE);
            if (Double.isFinite(part.buildingHeight())) {
                f.put("buildingHeight", round(part.buildingHeight()));
            }
        }
        for (EdgeExposure e : result.edges()) {
            ObjectNode f = feature(features, "exposed-edge", geometry.lineString(e.line(), true));
            owner(f, e.ownerName(), e.ownerId());
            f.put("kind", kindName(e.kind()));
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
            ObjectNode f = feature(features, "exposed-corner", geometry.point(c.point(), true));
            owner(f, c.ownerName(), c.ownerId());
            if (!Double.isNaN(c.point().getZ())) {
                f.put("top", round(c.point().getZ()));
            }
        }
        parts(features, site, result, geometry);
        for (ModelWarning w : result.warnings()) {
            warning(feature(features, "model-warning", geometry.multiLineString(w.where(), false)), w);
        }
        return root;
    }

    /** Rods and conductors where they stand (from the site's surface), in the site's order. */
    private static void parts(ArrayNode features, Site site, AnalysisResult result, GeoJsonGeometry geometry) {
        if (site.rods().isEmpty() && site.conductors().isEmpty()) {
            return;
        }
        Map<String, Boolean> intercepts = new HashMap<>();
        for (PartInterception p : result.parts()) {
            intercepts.merge(p.kind() + "|" + p.partId(), p.intercepts(), Boolean::logicalOr);
        }
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        for (SiteSurface.PlacedRod r : surface.rods()) {
            ObjectNode f = feature(features, "rod", geometry.point(r.tip(), true));
            f.put("id", r.rod().id());
            f.put("name", r.rod().name());
            f.put("height", round(r.rod().height()));
            f.put("intercepts", intercepts.getOrDefault(PartInterception.PartKind.ROD + "|" + r.rod().id(), false));
        }
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            ObjectNode f = feature(features, "conductor", geometry.lineString(c.path(), true));
            f.put("id", c.conductor().id());
            f.put("name", c.conductor().name());
            f.put("intercepts", intercepts.getOrDefault(PartInterception.PartKind.CONDUCTOR + "|"
                    + c.conductor().id(), false));
        }
    }

    /** The properties of a model warning, in its feature and in the summary's list alike. */
    private static void warning(ObjectNode properties, ModelWarning w) {
        properties.put("kind", warningKind(w.kind()));
        properties.put("part", w.partId());
        properties.put("partName", w.partName());
        properties.put("heightAboveSurface", round(w.value()));
        properties.put("radius", round(w.limit()));
        properties.put("text", w.text());
    }

    /** A warning kind as written: {@code free-span}. */
    static String warningKind(ModelWarning.Kind kind) {
        return kind.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static ObjectNode analysis(Site site, String sourceName, AnalysisResult result) {
        ResultTotals totals = ResultTotals.of(result);
        ObjectNode a = Json.MAPPER.createObjectNode();
        a.put("site", site.name());
        if (sourceName != null) {
            a.put("source", sourceName);
        }
        a.put("level", result.sphere().level().name());
        a.put("sphereRadius", result.sphere().radius());
        a.put("customRadius", result.sphere().isCustomRadius());
        a.put("resolution", result.resolution());
        a.put("tolerance", result.tolerance());
        a.put("method", METHOD);
        a.put("standard", STANDARD);
        a.put("elevations", ELEVATIONS);
        a.put("envelopeMillis", result.envelopeMillis());
        a.put("totalMillis", result.totalMillis());
        ObjectNode s = a.putObject("summary");
        s.put("roofArea", round(totals.roofArea()));
        s.put("exposedRoofArea", round(totals.exposedRoofArea()));
        s.put("exposedEdgeLength", round(totals.edgeLength()));
        ObjectNode byKind = s.putObject("exposedEdgeLengthByKind");
        totals.edgeLengths().forEach((kind, length) -> byKind.put(kindName(kind), round(length)));
        s.put("exposedCorners", totals.corners());
        s.put("facadeBands", totals.facadeBands());
        s.put("facadeBandLength", round(totals.facadeLength()));
        s.put("negligibleFacadeBands", totals.negligibleBands());
        s.put("negligibleFacadeBandLength", round(totals.negligibleLength()));
        s.put("airTerminationParts", totals.parts());
        s.put("interceptingParts", totals.interceptingParts());
        s.put("protectedGroundArea", round(totals.protectedGround()));
        s.put("fullyProtected", result.isFullyProtected());
        ArrayNode warnings = s.putArray("warnings");
        result.warnings().forEach(w -> warning(warnings.addObject(), w));
        ArrayNode cautions = a.putArray("cautions");
        Cautions.lines().forEach(cautions::add);
        return a;
    }

    /** An edge kind as written: {@code roof-edge}, {@code parapet}, {@code ridge}, {@code hip}, {@code object-edge}. */
    static String kindName(EdgeKind kind) {
        return kind.name().toLowerCase(Locale.ROOT).replace('_', '-');
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

    private static void owner(ObjectNode properties, String name, String id) {
        properties.put("owner", name);
        properties.put("ownerId", id);
    }

    /** To the centimetre, as every value of the stored form. */
    public static double round(double value) {
        return Math.round(value * 100) / 100.0;
    }
}
