package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;

/**
 * The bound of what an edit can do to the envelope is never above the definition: for points near
 * a moved rod, every term D(c) − √(R² − |c − p|²) over sampled centre columns c within R of the
 * changed parts (rolling sphere geometry: D changes nowhere else), with D exact at c, before and
 * after the edit, is at or above the bound.
 */
class ChangeBoundTest {

    private static final Site CAMPUS = SiteReader.read(Path.of("sample-sites/brookfield-campus.geojson")).site();

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {20, 30, 60})
    void boundIsBelowEveryTermOfTheChangedColumns(double radius) {
        Random rnd = new Random((long) radius * 7);
        double h = 0.5;
        EnvelopeField before = EnvelopeOp.compute(SiteSurfaceBuilder.build(CAMPUS), radius, h);
        List<Rod> rods = new ArrayList<>(CAMPUS.rods());
        Rod old = rods.get(0);
        Rod moved = new Rod(old.id(), old.name(), old.x() + 3, old.y() - 2, old.height() + 1);
        rods.set(0, moved);
        Site site = CAMPUS.withAirTermination(rods, CAMPUS.conductors());
        double[] box = {Math.min(old.x(), moved.x()), Math.min(old.y(), moved.y()), Math.max(old.x(), moved.x()),
            Math.max(old.y(), moved.y())};
        EnvelopeField after = EnvelopeOp.update(before, SiteSurfaceBuilder.build(site), box[0], box[1], box[2], box[3]);
        ChangeBound bound = ChangeBound.of(before, after, box);
        int checked = 0;
        for (int k = 0; k < 60; k++) {
            double px = moved.x() + (rnd.nextDouble() * 2 - 1) * 1.5 * radius;
            double py = moved.y() + (rnd.nextDouble() * 2 - 1) * 1.5 * radius;
            double b = bound.lowerOver(px, py, px, py);
            for (int s = 0; s < 400; s++) {
                // a column within R of the changed parts and within R of p
                double a = rnd.nextDouble() * 2 * Math.PI, r = radius * Math.sqrt(rnd.nextDouble());
                double cx = (box[0] + box[2]) / 2 + r * Math.cos(a), cy = (box[1] + box[3]) / 2 + r * Math.sin(a);
                double d2 = (cx - px) * (cx - px) + (cy - py) * (cy - py);
                if (d2 > radius * radius) {
                    continue;
                }
                for (EnvelopeField f : List.of(before, after)) {
                    double term = f.refiner().centreHeight(cx, cy) - Math.sqrt(radius * radius - d2);
                    assertThat(b).as("bound at (%.2f, %.2f) against the column (%.2f, %.2f)", px, py, cx, cy)
                            .isLessThanOrEqualTo(term);
                    checked++;
                }
            }
        }
        assertThat(checked).isGreaterThan(1000);
    }

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {30})
    void farFromTheChangeNothingCanReach(double radius) {
        EnvelopeField field = EnvelopeOp.compute(SiteSurfaceBuilder.build(CAMPUS), radius, 0.5);
        Rod rod = CAMPUS.rods().get(0);
        double[] box = {rod.x(), rod.y(), rod.x(), rod.y()};
        ChangeBound bound = ChangeBound.of(field, field, box);
        // columns change only within R of the rod, and they reach only R further: beyond 2R nothing
        double far = 2 * radius + 4;
        assertThat(bound.lowerOver(rod.x() + far, rod.y(), rod.x() + far + 1, rod.y() + 1)).isInfinite();
        assertThat(bound.lowerOver(rod.x() - 1, rod.y() - 1, rod.x() + 1, rod.y() + 1)).isFinite();
    }
}
