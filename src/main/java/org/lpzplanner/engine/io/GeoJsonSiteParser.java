package org.lpzplanner.engine.io;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import tools.jackson.core.JacksonException;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.json.JsonReadFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectReader;

/**
 * Reads the GeoJSON site format (see docs/site-format.md): checks the collection, reads every
 * feature's envelope and geometry, projects lon/lat onto a local plane centred on the site, then
 * builds the model objects and checks the site as a whole.
 */
final class GeoJsonSiteParser {

    static final String LOCAL_METRES = "local-metres";

    // NaN and Infinity are let through the parser so the field they are in can be named.
    private static final ObjectReader JSON = Json.MAPPER.reader().with(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS);

    private final String source;
    private final GeometryFactory factory = new GeometryFactory();

    GeoJsonSiteParser(String source) {
        this.source = source;
    }

    SiteDocument parse(String text) {
        JsonNode root = parseJson(text);
        JsonNode features = features(root);
        boolean lonLat = lonLat(root);
        RawFeatureReader reader = new RawFeatureReader(source, factory, lonLat);
        List<RawFeature> raw = new ArrayList<>();
        for (int i = 0; i < features.size(); i++) {
            raw.add(reader.read(features.get(i), i));
        }
        checkSize(raw);
        DuplicateFeatures.reject(raw);
        List<String> ids = FeatureIds.assign(raw);
        LocalProjection projection = null;
        if (lonLat && !raw.isEmpty()) {
            LocalProjection plane = PlaneMapping.centredOn(raw);
            raw.replaceAll(f -> PlaneMapping.toLocal(f, plane));
            projection = plane;
        }
        String advice = lonLat
                ? "check for a stray coordinate; if the positions are metres, add \"coordinates\": \"local-metres\""
                        + " at the top level of the file"
                : "check for a stray coordinate or wrong units";
        Site site = build(siteName(root), raw, ids, new FeatureBuilder(factory, new FootprintCheck(projection)),
                advice);
        return new SiteDocument(site, projection, source);
    }

    private Site build(String name, List<RawFeature> raw, List<String> ids, FeatureBuilder builder,
            String extentAdvice) {
        List<Structure> structures = new ArrayList<>();
        List<RooftopObject> objects = new ArrayList<>();
        List<Rod> rods = new ArrayList<>();
        List<Conductor> conductors = new ArrayList<>();
        List<SiteExtent.Part> parts = new ArrayList<>();
        for (int i = 0; i < raw.size(); i++) {
            RawFeature feature = raw.get(i);
            String id = ids.get(i);
            Envelope bounds = switch (feature.kind()) {
                case STRUCTURE -> {
                    Structure structure = builder.structure(feature, id);
                    structures.add(structure);
                    yield structure.footprint().getEnvelopeInternal();
                }
                case ROOFTOP_OBJECT -> {
                    RooftopObject object = builder.rooftopObject(feature, id);
                    objects.add(object);
                    yield object.footprint().getEnvelopeInternal();
                }
                case ROD -> {
                    Rod rod = builder.rod(feature, id);
                    rods.add(rod);
                    yield new Envelope(rod.x(), rod.x(), rod.y(), rod.y());
                }
                case CONDUCTOR -> {
                    conductors.add(builder.conductor(feature, id));
                    yield feature.geometry().getEnvelopeInternal();
                }
            };
            parts.add(new SiteExtent.Part(feature.place(), bounds));
        }
        if (structures.isEmpty()) {
            throw new SiteFormatException(source, "the site has no structure; add at least one feature with"
                    + " \"kind\": \"structure\"");
        }
        SiteExtent.check(source, parts, extentAdvice);
        return new Site(name, structures, objects, rods, conductors);
    }

    /** The limits per site, counted on the features as read, before they are checked one by one. */
    private void checkSize(List<RawFeature> raw) {
        long structures = 0;
        long parts = 0;
        long vertices = 0;
        for (RawFeature f : raw) {
            switch (f.kind()) {
                case STRUCTURE -> structures++;
                case ROD, CONDUCTOR -> parts++;
                default -> {
                }
            }
            vertices += f.geometry() == null ? 0 : f.geometry().getNumPoints();
        }
        SiteSize.check(source, "features", structures, parts, vertices);
    }

    private JsonNode parseJson(String text) {
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (JacksonException e) {
            TokenStreamLocation at = e.getLocation();
            String problem = "not valid JSON: " + firstLine(e.getOriginalMessage());
            if (at != null && at.getLineNr() > 0) {
                throw SiteFormatException.atLine(source, at.getLineNr(), at.getColumnNr() > 0 ? at.getColumnNr() : null,
                        null, problem, e);
            }
            throw new SiteFormatException(source, problem, e);
        }
        if (root == null || root.isMissingNode() || root.isNull()) {
            throw new SiteFormatException(source, "the file is empty; expected a GeoJSON FeatureCollection");
        }
        return root;
    }

    private JsonNode features(JsonNode root) {
        if (!root.isObject()) {
            throw new SiteFormatException(source, "the file must hold a GeoJSON FeatureCollection object, got "
                    + Texts.shown(root));
        }
        JsonNode type = root.path("type");
        if (!type.isString() || !"FeatureCollection".equals(type.stringValue())) {
            throw SiteFormatException.atMember(source, "type", "must be \"FeatureCollection\", got " + Texts.shown(type)
                    + "; a site file is a FeatureCollection of structures and air-termination parts");
        }
        JsonNode features = root.path("features");
        if (!features.isArray()) {
            throw SiteFormatException.atMember(source, "features", "must be an array of features, got "
                    + Texts.shown(features));
        }
        return features;
    }

    private boolean lonLat(JsonNode root) {
        JsonNode coordinates = root.path("coordinates");
        if (coordinates.isMissingNode() || coordinates.isNull()) {
            return true;
        }
        if (coordinates.isString() && LOCAL_METRES.equals(coordinates.stringValue())) {
            return false;
        }
        throw SiteFormatException.atMember(source, "coordinates", "must be \"" + LOCAL_METRES + "\" or left out (then"
                + " positions are WGS84 longitude/latitude), got " + Texts.shown(coordinates));
    }

    private String siteName(JsonNode root) {
        JsonNode name = root.path("name");
        if (name.isMissingNode() || name.isNull()) {
            return SiteReader.baseName(source);
        }
        if (!name.isString() || name.stringValue().isBlank()) {
            throw SiteFormatException.atMember(source, "name", "must be non-empty text, got " + Texts.shown(name));
        }
        return name.stringValue().trim();
    }

    /** The parser's own explanation, without its multi-line detail and internal source descriptions. */
    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable content";
        }
        int end = message.indexOf('\n');
        String line = end < 0 ? message : message.substring(0, end);
        return line.replaceAll("\\s*\\(start marker at \\[Source:[^\\]]*\\]\\)", "")
                .replaceAll("\\s*\\[Source:[^\\]]*\\]", "").strip();
    }
}
