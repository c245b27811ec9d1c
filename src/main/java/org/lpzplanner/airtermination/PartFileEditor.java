package org.lpzplanner.airtermination;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Adds, moves and removes rods, and adds, reshapes and removes conductors, in a stored GeoJSON site file.
 * Positions come in local metres and
 * are written in the file's own coordinates: local metres (to the millimetre) as they are, lon/lat
 * (to 10⁻⁸ degree, about a millimetre) through the site's {@link LocalProjection}; conductor
 * elevations (third values) stay metres above ground. Every rod and conductor of the file is given
 * its id explicitly, so that removing one does not renumber the others. All other
 * features and members are kept as they are. The result is not checked here; the edit pipeline
 * reads it back through the engine's reader before storing it.
 */
final class PartFileEditor {


    private final ObjectNode root;
    private final ArrayNode features;
    private final LocalProjection projection;

    /**
     * An editor of the stored site's file.
     *
     * @param document the site's file as the engine read it
     * @throws InvalidInputException when the file is WKT, which cannot hold parts
     */
    static PartFileEditor open(StoredSite site, SiteDocument document) {
        if (!SiteFiles.isGeoJson(site.sourceText(), site.sourceName())) {
            throw new InvalidInputException("file", "a WKT site file cannot hold rods (it holds flat-roofed"
                    + " structures only); upload the site as GeoJSON to place air-termination");
        }
        return new PartFileEditor(site.sourceText(), document.site().rods(), document.site().conductors(),
                document.projection());
    }

    /**
     * @param rods       the rods the engine read from {@code text}, in file order
     * @param conductors the conductors the engine read from {@code text}, in file order
     * @param projection the site's projection, or null when the file is in local metres
     */
    PartFileEditor(String text, List<Rod> rods, List<Conductor> conductors, LocalProjection projection) {
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        JsonNode parsed;
        try {
            parsed = Json.MAPPER.readTree(body);
        } catch (JacksonException e) {
            throw new InvalidInputException("file", "the stored site file cannot be read as JSON");
        }
        if (!(parsed instanceof ObjectNode object) || !(object.path("features") instanceof ArrayNode array)) {
            throw new InvalidInputException("file", "the stored site file has no features array");
        }
        this.root = object;
        this.features = array;
        this.projection = projection;
        int index = 0, conductorIndex = 0;
        for (JsonNode feature : features) {
            if (isRod(feature)) {
                if (index < rods.size() && feature instanceof ObjectNode f && !f.has("id")
                        && !f.path("properties").has("id")) {
                    f.put("id", rods.get(index).id());
                }
                index++;
            } else if (isConductor(feature)) {
                if (conductorIndex < conductors.size() && feature instanceof ObjectNode f && !f.has("id")
                        && !f.path("properties").has("id")) {
                    f.put("id", conductors.get(conductorIndex).id());
                }
                conductorIndex++;
            }
        }
    }

    /**
     * Appends a conductor feature: a LineString through {@code points} ([x, y] local metres, or
     * [x, y, elevation above ground] for every point), following the surface at
     * {@code heightAboveRoof} when that is given.
     */
    void addConductor(String id, String name, List<double[]> points, BigDecimal heightAboveRoof) {
        ObjectNode feature = features.addObject();
        feature.put("type", "Feature");
        feature.put("id", id);
        ObjectNode properties = feature.putObject("properties");
        properties.put("kind", "conductor");
        if (name != null && !name.isBlank()) {
            properties.put("name", name.strip());
        }
        if (heightAboveRoof != null) {
            properties.put("heightAboveRoof", heightAboveRoof);
        }
        feature.set("geometry", lineString(points, heightAboveRoof == null));
    }

    /**
     * Gives the conductor at this index among the file's conductors a new path (as for
     * {@link #addConductor}) and, when {@code name} is not blank, a new name. With
     * {@code heightAboveRoof} it follows the surface; without, the points' elevations hold.
     */
    void changeConductor(int conductorIndex, String name, List<double[]> points, BigDecimal heightAboveRoof) {
        ObjectNode feature = conductorFeature(conductorIndex);
        ObjectNode properties = feature.path("properties") instanceof ObjectNode p ? p : feature.putObject("properties");
        if (name != null && !name.isBlank()) {
            properties.put("name", name.strip());
        }
        if (heightAboveRoof != null) {
            properties.put("heightAboveRoof", heightAboveRoof);
        } else {
            properties.remove("heightAboveRoof");
        }
        feature.set("geometry", lineString(points, heightAboveRoof == null));
    }

    private ObjectNode lineString(List<double[]> points, boolean elevations) {
        ObjectNode geometry = Json.MAPPER.createObjectNode();
        geometry.put("type", "LineString");
        ArrayNode coordinates = geometry.putArray("coordinates");
        for (double[] p : points) {
            ArrayNode position = (ArrayNode) point(p[0], p[1]).get("coordinates");
            if (elevations) {
                position.add(round(p[2], 3));
            }
            coordinates.add(position);
        }
        return geometry;
    }

    private ObjectNode conductorFeature(int conductorIndex) {
        int seen = -1;
        for (JsonNode feature : features) {
            if (isConductor(feature) && ++seen == conductorIndex) {
                return (ObjectNode) feature;
            }
        }
        throw new IllegalArgumentException("no conductor number " + conductorIndex);
    }

    /** Removes the conductor at this index among the file's conductors. */
    void removeConductor(int conductorIndex) {
        int seen = -1;
        for (int i = 0; i < features.size(); i++) {
            if (isConductor(features.get(i)) && ++seen == conductorIndex) {
                features.remove(i);
                return;
            }
        }
        throw new IllegalArgumentException("no conductor number " + conductorIndex);
    }

    /** Appends a rod feature at the end of the file. */
    void add(String id, String name, double x, double y, BigDecimal height) {
        ObjectNode feature = features.addObject();
        feature.put("type", "Feature");
        feature.put("id", id);
        ObjectNode properties = feature.putObject("properties");
        properties.put("kind", "rod");
        if (name != null && !name.isBlank()) {
            properties.put("name", name.strip());
        }
        properties.put("height", height);
        feature.set("geometry", point(x, y));
    }

    /** Moves the rod at this index among the file's rods, and/or changes its height. */
    void change(int rodIndex, Double x, Double y, BigDecimal height) {
        ObjectNode feature = rodFeature(rodIndex);
        if (x != null && y != null) {
            feature.set("geometry", point(x, y));
        }
        if (height != null) {
            ObjectNode properties = (ObjectNode) feature.path("properties");
            properties.put("height", height);
        }
    }

    /** Removes the rod at this index among the file's rods. */
    void remove(int rodIndex) {
        int seen = -1;
        for (int i = 0; i < features.size(); i++) {
            if (isRod(features.get(i)) && ++seen == rodIndex) {
                features.remove(i);
                return;
            }
        }
        throw new IllegalArgumentException("no rod number " + rodIndex);
    }

    /** The edited file text. */
    String text() {
        return Json.MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }

    private ObjectNode rodFeature(int rodIndex) {
        int seen = -1;
        for (JsonNode feature : features) {
            if (isRod(feature) && ++seen == rodIndex) {
                return (ObjectNode) feature;
            }
        }
        throw new IllegalArgumentException("no rod number " + rodIndex);
    }

    private ObjectNode point(double x, double y) {
        ObjectNode geometry = Json.MAPPER.createObjectNode();
        geometry.put("type", "Point");
        ArrayNode coordinates = geometry.putArray("coordinates");
        if (projection == null) {
            coordinates.add(round(x, 3));
            coordinates.add(round(y, 3));
        } else {
            Coordinate lonLat;
            try {
                lonLat = projection.toLonLat(x, y);
            } catch (IllegalArgumentException e) {
                throw new InvalidInputException("x", "the position x=" + x + ", y=" + y
                        + " m cannot be placed on the map; choose a point on or near the site");
            }
            coordinates.add(round(lonLat.x, 8));
            coordinates.add(round(lonLat.y, 8));
        }
        return geometry;
    }

    private static boolean isRod(JsonNode feature) {
        return feature instanceof ObjectNode && "rod".equals(feature.path("properties").path("kind").stringValue());
    }

    private static boolean isConductor(JsonNode feature) {
        return feature instanceof ObjectNode && "conductor".equals(feature.path("properties").path("kind").stringValue());
    }

    private static BigDecimal round(double value, int places) {
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return rounded.scale() < 0 ? rounded.setScale(0) : rounded;
    }
}
