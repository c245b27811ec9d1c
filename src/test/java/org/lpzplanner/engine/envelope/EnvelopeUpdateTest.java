package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.api.parallel.Execution;
import org.junit.jupiter.api.parallel.ExecutionMode;
import org.junit.jupiter.params.provider.ValueSource;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;

/**
 * Moving, adding or removing a part and updating only the affected windows gives the same envelope
 * as computing it afresh: D changes only within R of the change and E only within 2R (rolling
 * sphere geometry), and within those windows the same values are computed from the same inputs.
 */
@Execution(ExecutionMode.CONCURRENT) // independent cases over immutable inputs: they share the cores
class EnvelopeUpdateTest {

    private static final Site CAMPUS = SiteReader.read(Path.of("sample-sites/brookfield-campus.geojson")).site();

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {20, 45})
    void updatingAfterMovingAndAddingRodsEqualsAFreshComputation(double radius) {
        Random rnd = new Random((long) radius);
        SiteSurface before = SiteSurfaceBuilder.build(CAMPUS);
        EnvelopeField field = EnvelopeOp.compute(before, radius, 0.5);
        Site site = CAMPUS;
        for (int step = 0; step < 3; step++) {
            List<Rod> rods = new ArrayList<>(site.rods());
            Rod old = rods.get(step % rods.size());
            Rod moved = new Rod(old.id(), old.name(), old.x() + rnd.nextDouble() * 6 - 3, old.y() + rnd.nextDouble() * 6 - 3,
                    old.height() + rnd.nextDouble());
            rods.set(step % rods.size(), moved);
            Rod added = new Rod("N" + step, "New " + step, moved.x() + 4, moved.y() - 2, 1.5);
            rods.add(added);
            site = site.withAirTermination(rods, site.conductors());
            SiteSurface after = SiteSurfaceBuilder.build(site);

            double minX = Math.min(old.x(), Math.min(moved.x(), added.x())), maxX = Math.max(old.x(), Math.max(moved.x(), added.x()));
            double minY = Math.min(old.y(), Math.min(moved.y(), added.y())), maxY = Math.max(old.y(), Math.max(moved.y(), added.y()));
            EnvelopeField updated = EnvelopeOp.update(field, after, minX, minY, maxX, maxY);
            EnvelopeField fresh = EnvelopeOp.compute(after, radius, 0.5);

            assertThat(updated.grid()).isEqualTo(fresh.grid());
            assertThat(updated.vertexLowers()).as("eroded vertex bounds, step %d", step).containsExactly(fresh.vertexLowers());
            for (int k = 0; k < 20; k++) {
                double x = moved.x() + rnd.nextDouble() * 2 * radius - radius, y = moved.y() + rnd.nextDouble() * 2 * radius - radius;
                assertThat(updated.heightAt(x, y, 0.001)).as("E at (%.2f, %.2f)", x, y)
                        .isCloseTo(fresh.heightAt(x, y, 0.001), org.assertj.core.data.Offset.offset(1e-9));
            }
            field = updated;
        }
    }

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {30, 60})
    void updatingAfterRemovingRodsEqualsAFreshComputation(double radius) {
        SiteSurface before = SiteSurfaceBuilder.build(CAMPUS);
        EnvelopeField field = EnvelopeOp.compute(before, radius, 0.5);
        Site site = CAMPUS;
        for (int step = 0; step < 2; step++) {
            List<Rod> rods = new ArrayList<>(site.rods());
            Rod gone = rods.remove(step * 3 % rods.size());
            site = site.withAirTermination(rods, site.conductors());
            SiteSurface after = SiteSurfaceBuilder.build(site);
            EnvelopeField updated = EnvelopeOp.update(field, after, gone.x(), gone.y(), gone.x(), gone.y());
            EnvelopeField fresh = EnvelopeOp.compute(after, radius, 0.5);
            assertThat(updated.vertexLowers()).as("eroded vertex bounds, step %d", step).containsExactly(fresh.vertexLowers());
            field = updated;
        }
    }
}
