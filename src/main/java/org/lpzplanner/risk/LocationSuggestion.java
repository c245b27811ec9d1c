package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.risk.CollectionAreaOp;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Neighbour;

/**
 * The app's suggestion for the location factor of a site: the tallest structure of the site file is
 * judged against the other structures of the file ({@link LocationFactor#suggest}). Trees and
 * buildings outside the site file are unknown to the app, so the user confirms or changes it.
 *
 * @param factor         the suggested class
 * @param structureName  the tallest structure, the one judged; null for a site without structures
 * @param height         its top height H in metres
 * @param reach          3·H in metres: objects farther away are not considered
 * @param near           structures of the file within that reach
 * @param higher         of those, how many are higher than H
 */
public record LocationSuggestion(LocationFactor factor, String structureName, double height, double reach, int near,
        int higher) {

    static LocationSuggestion of(Site site) {
        Structure tallest = null;
        for (Structure s : site.structures()) {
            if (tallest == null || s.topHeight() > tallest.topHeight()) {
                tallest = s;
            }
        }
        if (tallest == null || !(tallest.topHeight() > 0)) {
            return new LocationSuggestion(LocationFactor.ISOLATED, null, 0, 0, 0, 0);
        }
        double h = tallest.topHeight();
        double reach = CollectionAreaOp.HEIGHT_FACTOR * h;
        List<Neighbour> neighbours = new ArrayList<>();
        int near = 0;
        int higher = 0;
        for (Structure s : site.structures()) {
            if (s != tallest) {
                double distance = tallest.footprint().distance(s.footprint());
                neighbours.add(new Neighbour(distance, s.topHeight()));
                if (distance <= reach) {
                    near++;
                    higher += s.topHeight() > h ? 1 : 0;
                }
            }
        }
        String name = tallest.name() == null || tallest.name().isBlank() ? tallest.id() : tallest.name();
        return new LocationSuggestion(LocationFactor.suggest(h, neighbours), name, h, reach, near, higher);
    }
}
