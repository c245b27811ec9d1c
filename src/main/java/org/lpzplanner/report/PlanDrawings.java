package org.lpzplanner.report;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.analysis.ResultDrawing;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.engine.design.DownConductorLayout;

/**
 * The report's plan: the {@link ResultDrawing} of the revision's stored result (review items
 * numbered E1, E2, … as the review list numbers them, accepted ones drawn apart; air-termination
 * parts numbered A1, A2, …), with the planned or edited down-conductors numbered D1, D2, … and the
 * site's stored keep-out areas numbered K1, K2, … (as stored when printed, like the down-conductors
 * edited by the designer). The pages draw the same model.
 */
final class PlanDrawings {

    private PlanDrawings() {
    }

    static PlanDrawing of(ReportFacts facts) {
        PlanDrawing.Builder drawing = ResultDrawing.of(facts.stored().features(), facts.source().accepted(),
                facts.partNumbers()).numbered().list(Layer.ACCEPTED_ITEM, Layer.DOWN_CONDUCTOR);
        int number = 0;
        for (DownConductorLayout layout : facts.downConductors()) {
            for (Coordinate c : layout.positions()) {
                number++;
                drawing.add(new PlanItem.DownConductor(c.x, c.y, "D" + number));
            }
        }
        List<StoredDesign.KeepOutArea> areas = facts.design().keepOutAreas();
        for (int i = 0; i < areas.size(); i++) {
            drawing.add(new PlanItem.KeepOutArea(areas.get(i).name(), areas.get(i).corners(), KeepOutSchedule.number(i)));
        }
        return drawing.build();
    }
}
