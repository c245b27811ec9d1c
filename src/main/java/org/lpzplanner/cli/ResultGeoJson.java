package org.lpzplanner.cli;

import java.util.HashMap;
import java.util.Map;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.PartInterception;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.io.SiteDocument;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * The results of one analysis as an RFC 7946 FeatureCollection, in the site file's coordinates
 * (lon/lat, or local metres flagged by a top-level {@code "coordinates": "local-metres"}, as in
 * site files). A top-level {@code "analysis"} member holds the settings, times, totals and
 * cautions. Every feature has a {@code properties.result}:
 *
 * <ul>
 *   <li>{@code exposed-roof}: exposed part of one roof face or rooftop-object top (Polygon or
 *       MultiPolygon; owner, ownerId, surface, face (1-based), exposedArea, roofArea in m²);</li>
 *   <li>{@code exposed-edge}: LineString with elevations (owner, ownerId, kind, length in m);</li>
 *   <li>{@code exposed-corner}: Point with elevation (owner, ownerId);</li>
 *   <li>{@code facade-band}: LineString along the wall foot (owner, ownerId, wall (1-based),
 *       length, bottom, top in m above ground);</li>
 *   <li>{@code part}: an air-termination part, a rod's tip as a Point or a conductor as a
 *       LineString, with elevations (id, name, partKind, intercepts);</li>
 *   <li>{@code protected-ground}: MultiPolygon of protected open ground (zone, area in m²).</li>
 * </ul>
 */
final class ResultGeoJson {

    static final String METHOD = "rolling sphere method";
    static final String STANDARD = "IEC 62305-3:2010 rolling sphere method";

    private final JsonNodeFactory nodes = JsonNodeFactory.instance;
    private final SiteDocument document;
    private final AnalysisResult result;
    private final GeoJsonGeometry geometry;

    private ResultGeoJson(SiteDocument document, AnalysisResult result) {
        this.document = document;
        this.result = result;
        this.geometry = new GeoJsonGeometry(SiteFrame.of(document), nodes);
    }

    /** The FeatureCollection for an analysis of the given site. */
    static ObjectNode of(SiteDocument document, AnalysisResult result) {
        return new ResultGeoJson(document, result).collection();
    }

    private ObjectNode collection() {
        ObjectNode root = nodes.objectNode();
        root.put("type", "FeatureCollection");
        root.put("name", document.site().name());
        if (!document.georeferenced()) {
            root.put("coordinates", "local-metres");
        }
        root.set("analysis", analysis(ResultTotals.of(result)));
        ArrayNode features = root.putArray("features");
        for (RoofExposure r : result.roofs()) {
            if (r.isExposed()) {
                ObjectNode p = feature(features, "exposed-roof", geometry.polygonal(r.exposed()));
                owner(p, r.ownerName(), r.ownerId());
                p.put("surface", r.kind() == SurfaceKind.ROOF ? "roof" : "rooftop-object");
                p.put("face", r.faceIndex() + 1);
                p.put("exposedArea", SiteFrame.round(r.exposedPlanArea(), 100));
                p.put("roofArea", SiteFrame.round(r.planArea(), 100));
            }
        }
        for (EdgeExposure e : result.edges()) {
            ObjectNode p = feature(features, "exposed-edge", geometry.lineString(e.line(), true));
            owner(p, e.ownerName(), e.ownerId());
            p.put("kind", ResultTotals.edgeKindName(e.kind()));
            p.put("length", SiteFrame.round(e.length(), 1e3));
        }
        for (CornerExposure c : result.corners()) {
            owner(feature(features, "exposed-corner", geometry.point(c.point(), true)), c.ownerName(), c.ownerId());
        }
        for (FacadeBand f : result.facades()) {
            ObjectNode p = feature(features, "facade-band", geometry.lineString(f.line(), false));
            owner(p, f.ownerName(), f.ownerId());
            p.put("wall", f.wallIndex() + 1);
            p.put("length", SiteFrame.round(f.length(), 1e3));
            p.put("bottom", SiteFrame.round(f.bottom(), 1e3));
            p.put("top", SiteFrame.round(f.top(), 1e3));
        }
        parts(features);
        if (result.protectedGround().planArea() > 0) {
            ObjectNode p = feature(features, "protected-ground", geometry.multiPolygon(result.protectedGround().area()));
            p.put("zone", "LPZ 0B");
            p.put("area", SiteFrame.round(result.protectedGround().planArea(), 100));
        }
        return root;
    }

    private ObjectNode analysis(ResultTotals totals) {
        ObjectNode a = nodes.objectNode();
        a.put("site", document.site().name());
        a.put("source", document.sourceName());
        a.put("level", result.sphere().level().name());
        a.put("sphereRadius", result.sphere().radius());
        a.put("customRadius", result.sphere().isCustomRadius());
        a.put("resolution", result.resolution());
        a.put("tolerance", result.tolerance());
        a.put("method", METHOD);
        a.put("standard", STANDARD);
        if (document.georeferenced()) {
            ObjectNode origin = a.putObject("localOrigin");
            origin.put("longitude", document.projection().centreLon());
            origin.put("latitude", document.projection().centreLat());
        }
        a.put("envelopeMillis", result.envelopeMillis());
        a.put("totalMillis", result.totalMillis());
        ObjectNode s = a.putObject("summary");
        s.put("roofArea", SiteFrame.round(totals.roofArea(), 100));
        s.put("exposedRoofArea", SiteFrame.round(totals.exposedRoofArea(), 100));
        s.put("exposedEdgeLength", SiteFrame.round(totals.edgeLength(), 1e3));
        ObjectNode byKind = s.putObject("exposedEdgeLengthByKind");
        totals.edgeLengths().forEach((kind, length) ->
                byKind.put(ResultTotals.edgeKindName(kind), SiteFrame.round(length, 1e3)));
        s.put("exposedCorners", totals.corners());
        s.put("facadeBands", totals.facadeBands());
        s.put("facadeBandLength", SiteFrame.round(totals.facadeLength(), 1e3));
        s.put("airTerminationParts", totals.parts());
        s.put("interceptingParts", totals.interceptingParts());
        s.put("protectedGroundArea", SiteFrame.round(totals.protectedGround(), 100));
        s.put("fullyProtected", result.isFullyProtected());
        ArrayNode cautions = a.putArray("cautions");
        Cautions.lines().forEach(cautions::add);
        return a;
    }

    private void parts(ArrayNode features) {
        // The engine reports parts by id; where they stand (and a rod's tip) comes from the surface.
        SiteSurface surface = SiteSurfaceBuilder.build(document.site());
        Map<String, ObjectNode> shapes = new HashMap<>();
        for (SiteSurface.PlacedRod r : surface.rods()) {
            shapes.put("ROD|" + r.rod().id(), geometry.point(r.tip(), true));
        }
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            shapes.put("CONDUCTOR|" + c.conductor().id(), geometry.lineString(c.path(), true));
        }
        for (PartInterception part : result.parts()) {
            ObjectNode shape = shapes.get(part.kind() + "|" + part.partId());
            ObjectNode p = feature(features, "part", shape);
            p.put("id", part.partId());
            p.put("name", part.partName());
            p.put("partKind", part.kind() == PartInterception.PartKind.ROD ? "rod" : "conductor");
            p.put("intercepts", part.intercepts());
        }
    }

    /** Appends a feature and returns its properties, with {@code result} already set. */
    private ObjectNode feature(ArrayNode features, String kind, ObjectNode shape) {
        ObjectNode f = features.addObject();
        f.put("type", "Feature");
        if (shape == null) {
            f.putNull("geometry");
        } else {
            f.set("geometry", shape);
        }
        ObjectNode p = f.putObject("properties");
        p.put("result", kind);
        return p;
    }

    private static void owner(ObjectNode properties, String name, String id) {
        properties.put("owner", name);
        properties.put("ownerId", id);
    }
}
