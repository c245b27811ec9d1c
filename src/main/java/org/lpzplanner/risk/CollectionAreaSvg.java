package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.drawing.PlanSvgRenderer;
import org.lpzplanner.drawing.Texts;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * The collection area A_D of a site on its plan, for the risk page: a {@link PlanDrawing} of the
 * collection area, the structures (shaded by height, named with their top heights) and the rooftop
 * objects, drawn by {@link PlanSvgRenderer} like the plan page's plan, with its scale bar, north
 * arrow and legend.
 */
final class CollectionAreaSvg {

    private static final double DRAW_HEIGHT = 520;

    private CollectionAreaSvg() {
    }

    static String render(Site site, Geometry zone, Texts texts) {
        PlanDrawing.Builder drawing = PlanDrawing.builder()
                .list(Layer.COLLECTION_AREA, Layer.STRUCTURE, Layer.ROOFTOP_OBJECT)
                .add(new PlanItem.CollectionArea(rings(zone)));
        for (Structure s : site.structures()) {
            drawing.add(new PlanItem.Structure(name(s), s.topHeight(), rings(s.footprint())));
        }
        for (RooftopObject o : site.rooftopObjects()) {
            drawing.add(new PlanItem.RooftopObject(o.name(), rings(o.footprint())));
        }
        return PlanSvgRenderer.render(drawing.build(), texts, new PlanSvgRenderer.Options("plan collection-area",
                texts.text("risk.plan.title", site.name()), DRAW_HEIGHT));
    }

    private static String name(Structure s) {
        return s.name() == null || s.name().isBlank() ? s.id() : s.name();
    }

    /** Every ring of every polygon of a geometry, in local metres. */
    private static List<List<double[]>> rings(Geometry g) {
        List<List<double[]>> rings = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            if (g.getGeometryN(i) instanceof Polygon p && !p.isEmpty()) {
                rings.add(ring(p.getExteriorRing()));
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    rings.add(ring(p.getInteriorRingN(h)));
                }
            }
        }
        return rings;
    }

    private static List<double[]> ring(LineString ring) {
        List<double[]> points = new ArrayList<>();
        for (Coordinate c : ring.getCoordinates()) {
            points.add(new double[] {c.x, c.y});
        }
        return points;
    }
}
