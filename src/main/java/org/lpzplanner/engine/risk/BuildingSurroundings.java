package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.engine.model.Structure;

/**
 * The structure a risk estimate assesses, and the objects around it, from the structures of a site.
 *
 * <p>Structures whose footprints touch or overlap (within {@link #TOUCH_TOLERANCE}) are parts of one
 * building: a cross-shaped or stepped building is often drawn as several structures. The assessed
 * structure is the building that holds the tallest structure; every part of it lies inside its
 * collection area A_D already, so none of its parts is an object around it. Only the other
 * buildings are: each counts once, at the distance between the nearest footprints of the two
 * buildings and at the top height of its own tallest part. The location factor C_D judges the
 * objects around the structure, not the structure's own parts [IEC 62305-2:2010 Annex A, Table A.1].
 *
 * <p>Safety direction: the tolerance joins parts that nearly touch, which can only remove objects
 * from the surroundings and so raise the suggested C_D (more dangerous events), never lower it.
 * O(n²) footprint distances for n structures; stateless and thread-safe.
 *
 * @param tallest    the tallest structure of the site; null when the site has none
 * @param parts      the structures forming the assessed building (the tallest one among them)
 * @param height     the building's top height H in metres (that of its tallest part)
 * @param neighbours the other buildings of the site, one object each
 */
public record BuildingSurroundings(Structure tallest, List<Structure> parts, double height,
        List<Neighbour> neighbours) {

    /**
     * Footprints closer than this many metres are taken as touching: shared walls of a projected
     * site file rarely meet exactly, and an expansion joint does not split a building.
     */
    public static final double TOUCH_TOLERANCE = 0.1;

    public BuildingSurroundings {
        parts = List.copyOf(parts);
        neighbours = List.copyOf(neighbours);
    }

    /** Groups the structures into buildings and judges the building of the tallest structure. */
    public static BuildingSurroundings of(List<Structure> structures) {
        Structure tallest = null;
        for (Structure s : structures) {
            if (tallest == null || s.topHeight() > tallest.topHeight()) {
                tallest = s;
            }
        }
        if (tallest == null) {
            return new BuildingSurroundings(null, List.of(), 0, List.of());
        }
        List<List<Structure>> buildings = buildings(structures);
        List<Structure> assessed = null;
        for (List<Structure> b : buildings) {
            if (b.contains(tallest)) {
                assessed = b;
            }
        }
        List<Neighbour> neighbours = new ArrayList<>();
        for (List<Structure> b : buildings) {
            if (b != assessed) {
                double distance = Double.POSITIVE_INFINITY;
                double height = 0;
                for (Structure other : b) {
                    height = Math.max(height, Math.max(0, other.topHeight()));
                    for (Structure part : assessed) {
                        distance = Math.min(distance, part.footprint().distance(other.footprint()));
                    }
                }
                neighbours.add(new Neighbour(distance, height));
            }
        }
        return new BuildingSurroundings(tallest, assessed, tallest.topHeight(), neighbours);
    }

    /** The structures grouped into buildings: transitively touching or overlapping footprints. */
    static List<List<Structure>> buildings(List<Structure> structures) {
        int n = structures.size();
        int[] group = new int[n];
        for (int i = 0; i < n; i++) {
            group[i] = i;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (structures.get(i).footprint().isWithinDistance(structures.get(j).footprint(), TOUCH_TOLERANCE)) {
                    int a = root(group, i);
                    int b = root(group, j);
                    group[Math.max(a, b)] = Math.min(a, b);
                }
            }
        }
        List<List<Structure>> buildings = new ArrayList<>();
        List<Integer> roots = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int r = root(group, i);
            int k = roots.indexOf(r);
            if (k < 0) {
                roots.add(r);
                buildings.add(new ArrayList<>());
                k = buildings.size() - 1;
            }
            buildings.get(k).add(structures.get(i));
        }
        return buildings;
    }

    private static int root(int[] group, int i) {
        while (group[i] != i) {
            group[i] = group[group[i]];
            i = group[i];
        }
        return i;
    }
}
