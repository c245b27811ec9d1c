package org.lpzplanner.risk;

import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.risk.BuildingSurroundings;
import org.lpzplanner.engine.risk.CollectionAreaOp;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Neighbour;

/**
 * The app's suggestion for the location factor of a site: the building that holds the tallest
 * structure of the site file (with every structure touching or overlapping it: its parts) is judged
 * against the other buildings of the file ({@link BuildingSurroundings}, {@link LocationFactor#suggest}).
 * Its own parts are not its surroundings. Trees and buildings outside the site file are unknown to
 * the app, so the user confirms or changes it.
 *
 * @param factor         the suggested class
 * @param structureName  the tallest structure, whose building is judged; null for a site without structures
 * @param parts          structures forming that building (1 for a building drawn as one structure)
 * @param height         its top height H in metres
 * @param reach          3·H in metres: objects farther away are not considered
 * @param near           other buildings of the file within that reach
 * @param higher         of those, how many are higher than H
 */
public record LocationSuggestion(LocationFactor factor, String structureName, int parts, double height, double reach,
        int near, int higher) {

    static LocationSuggestion of(Site site) {
        BuildingSurroundings b = BuildingSurroundings.of(site.structures());
        Structure tallest = b.tallest();
        if (tallest == null || !(b.height() > 0)) {
            return new LocationSuggestion(LocationFactor.ISOLATED, null, 0, 0, 0, 0, 0);
        }
        double h = b.height();
        double reach = CollectionAreaOp.HEIGHT_FACTOR * h;
        int near = 0;
        int higher = 0;
        for (Neighbour n : b.neighbours()) {
            if (n.distance() <= reach) {
                near++;
                higher += n.height() > h ? 1 : 0;
            }
        }
        String name = tallest.name() == null || tallest.name().isBlank() ? tallest.id() : tallest.name();
        return new LocationSuggestion(LocationFactor.suggest(h, b.neighbours()), name, b.parts().size(), h, reach,
                near, higher);
    }
}
