package org.lpzplanner.airtermination;

import static org.lpzplanner.airtermination.PartsView.round;

import java.math.BigDecimal;
import java.util.List;
import org.lpzplanner.editing.AuditLine;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.editing.SiteChange;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;

/**
 * Adds, reshapes (or moves) and removes one roof conductor or catenary wire of a stored GeoJSON
 * site file: each a change given to the {@link EditPipeline}, which stores it, keeps the earlier
 * file, audits it and analyses the site again. A bad value stores nothing and names the field.
 */
@Service
public class ConductorEdits {

    private final EditPipeline edits;

    public ConductorEdits(EditPipeline edits) {
        this.edits = edits;
    }

    /**
     * Adds a conductor.
     *
     * @return the edit, whose outcome is the new conductor's id
     * @throws InvalidInputException when points or heights are missing or unusable, or the file is WKT
     * @throws org.lpzplanner.engine.io.SiteFormatException when the changed file is not a valid site
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer at
     *         {@code expectedVersion}
     */
    public Edit<String> add(long siteId, long expectedVersion, ConductorInput input) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            BigDecimal heightAboveRoof = PartChecks.checkedConductor(input);
            String id = PartChecks.newId(PartChecks.usedIds(document.site()), input.id(), "conductor");
            editor.addConductor(id, input.name(), input.points(), heightAboveRoof);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("conductor-added", "conductor " + id
                    + named(input.name()) + " with " + input.points().size() + " points "
                    + (heightAboveRoof == null ? "at elevations above ground"
                            : heightAboveRoof.toPlainString() + " m above the surface")), id);
        });
    }

    /**
     * Moves the vertices of a conductor, or the whole conductor: {@code points} replace its path.
     * Points [x, y] keep a roof conductor's {@code heightAboveRoof} unless a new one is given (and
     * need one when the conductor was a wire); points [x, y, elevation] make it hold those
     * elevations above ground. A given {@code name} renames it. The conductor keeps its id and its
     * place in the file.
     *
     * @return the edit, whose outcome is the conductor as it was before the change
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id or the site no
     *         conductor with this id
     * @throws InvalidInputException when points or heights are missing or unusable (nothing is stored)
     */
    public Edit<PartsView.ConductorView> change(long siteId, long expectedVersion, String conductorId,
            ConductorInput input) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            int index = PartChecks.conductorIndex(site, document.site(), conductorId);
            List<double[]> points = PartChecks.checkedPoints(input.points());
            Conductor now = document.site().conductors().get(index);
            BigDecimal heightAboveRoof = heightAboveRoof(conductorId, now, points, input.heightAboveRoof());
            PartChecks.checkName(input.name());
            PartsView.ConductorView before = PartsView.view(now, document.projection());
            editor.changeConductor(index, input.name(), points, heightAboveRoof);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("conductor-changed", "conductor "
                    + conductorId + " path from " + describe(before.path()) + " to " + describe(points)
                    + (heightAboveRoof == null ? ", elevations above ground"
                            : ", " + heightAboveRoof.stripTrailingZeros().toPlainString() + " m above the surface")),
                    before);
        });
    }

    /**
     * Removes a conductor.
     *
     * @return the edit, whose outcome is the conductor as it was, so that it can be put back
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id or the site no
     *         conductor with this id
     */
    public Edit<PartsView.ConductorView> remove(long siteId, long expectedVersion, String conductorId) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            int index = PartChecks.conductorIndex(site, document.site(), conductorId);
            PartsView.ConductorView before = PartsView.view(document.site().conductors().get(index),
                    document.projection());
            editor.removeConductor(index);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("conductor-removed", "conductor "
                    + conductorId + named(before.name()) + " along " + describe(before.path())), before);
        });
    }

    /**
     * The new path's height above the surface: the one given with points [x, y], else the
     * conductor's own when it follows the surface; null for points with elevations.
     */
    private static BigDecimal heightAboveRoof(String conductorId, Conductor now, List<double[]> points, String given) {
        boolean isGiven = given != null && !given.isBlank();
        if (points.get(0).length == 2) {
            if (isGiven) {
                return PartChecks.heightAboveSurface(given);
            }
            if (now.followsSurface()) {
                return BigDecimal.valueOf(now.heightAboveRoof());
            }
            throw new InvalidInputException("points", "conductor \"" + conductorId + "\" holds elevations above"
                    + " ground: give every point as [x, y, elevation], or give heightAboveRoof to make it follow"
                    + " the surface");
        }
        if (isGiven) {
            throw new InvalidInputException("heightAboveRoof", "give either heightAboveRoof with points [x, y], or"
                    + " points [x, y, elevation above ground], not both");
        }
        return null;
    }

    private static String describe(List<double[]> path) {
        StringBuilder out = new StringBuilder();
        for (double[] p : path) {
            out.append(out.isEmpty() ? "" : " ").append('(').append(round(p[0])).append(", ").append(round(p[1]));
            if (p.length > 2) {
                out.append(", ").append(round(p[2]));
            }
            out.append(')');
        }
        return out.toString();
    }

    private static String named(String name) {
        return name == null || name.isBlank() ? "" : " \"" + name.strip() + "\"";
    }
}
