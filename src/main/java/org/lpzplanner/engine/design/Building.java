package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.union.UnaryUnionOp;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A building as down-conductors see it: the structures of a site whose footprints overlap or touch
 * (the site model treats them as one solid), with the outline of the whole, the union of their
 * footprints (courtyards included as holes). Its id is the id of its first structure in site
 * order, its name the names of its structures joined by " + ".
 *
 * @param structures its structures, in site order
 * @param outline    the union of their footprints (Polygon or MultiPolygon)
 */
public record Building(String id, String name, List<Structure> structures, Geometry outline) {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    public Building {
        structures = List.copyOf(structures);
    }

    /** One structure on its own (the outline is its footprint). */
    public static Building of(Structure structure) {
        return new Building(structure.id(), label(structure), List.of(structure), structure.footprint());
    }

    /**
     * The buildings of a site, ordered by their first structure: structures are grouped when their
     * footprints intersect (overlap or touch, exactly as JTS {@code intersects}), also through a
     * chain of others.
     */
    public static List<Building> of(Site site) {
        List<Structure> all = site.structures();
        int[] parent = new int[all.size()];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (int i = 0; i < all.size(); i++) {
            for (int j = i + 1; j < all.size(); j++) {
                if (all.get(i).footprint().intersects(all.get(j).footprint())) {
                    parent[root(parent, j)] = root(parent, i);
                }
            }
        }
        List<Building> out = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            if (root(parent, i) != i) {
                continue;
            }
            List<Structure> members = new ArrayList<>();
            for (int j = 0; j < all.size(); j++) {
                if (root(parent, j) == i) {
                    members.add(all.get(j));
                }
            }
            out.add(members.size() == 1 ? of(members.get(0)) : group(members));
        }
        out.sort((a, b) -> Integer.compare(all.indexOf(a.structures().get(0)), all.indexOf(b.structures().get(0))));
        return out;
    }

    private static Building group(List<Structure> members) {
        List<Geometry> footprints = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (Structure s : members) {
            footprints.add(s.footprint());
            names.add(label(s));
        }
        return new Building(members.get(0).id(), String.join(" + ", names), members, UnaryUnionOp.union(footprints));
    }

    private static int root(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static String label(Structure s) {
        return s.name() == null || s.name().isBlank() ? s.id() : s.name();
    }

    /** The ids of its structures. */
    public List<String> structureIds() {
        return structures.stream().map(Structure::id).toList();
    }

    /** True when the id is the building's or one of its structures'. */
    public boolean answersTo(String structureOrBuildingId) {
        return structureIds().contains(structureOrBuildingId);
    }

    /** The highest wall top of its structures, metres. */
    public double height() {
        return structures.stream().mapToDouble(Structure::height).max().orElse(0);
    }

    /**
     * Edited down-conductor positions stored per structure, read for the building as a whole: the
     * positions stored under any of its structures, in structure order, a position repeated within
     * 1 cm counted once, and positions farther than {@link DownConductorPlan#EDIT_REACH} m from the
     * building's outline (they stood by a wall that is now inside the building) left out and listed
     * in {@link StoredPositions#dropped()}.
     *
     * @param byStructure stored positions by structure id (may hold other buildings' structures)
     */
    public StoredPositions storedPositions(Map<String, List<Coordinate>> byStructure) {
        List<Coordinate> kept = new ArrayList<>();
        List<Coordinate> dropped = new ArrayList<>();
        boolean edited = false;
        Geometry boundary = outline.getBoundary();
        for (String id : structureIds()) {
            List<Coordinate> stored = byStructure.get(id);
            if (stored == null || stored.isEmpty()) {
                continue;
            }
            edited = true;
            for (Coordinate c : stored) {
                if (kept.stream().anyMatch(k -> k.distance(c) < 0.01)) {
                    continue;
                }
                (boundary.distance(GEOMETRY.createPoint(c)) <= DownConductorPlan.EDIT_REACH ? kept : dropped).add(c);
            }
        }
        return new StoredPositions(edited, kept, dropped);
    }

    /**
     * Stored positions of a building.
     *
     * @param edited    true when any of its structures has stored positions
     * @param positions the positions that stand for the building
     * @param dropped   stored positions left out (more than 2 m from the outline of the whole)
     */
    public record StoredPositions(boolean edited, List<Coordinate> positions, List<Coordinate> dropped) {

        public StoredPositions {
            positions = List.copyOf(positions);
            dropped = List.copyOf(dropped);
        }
    }
}
