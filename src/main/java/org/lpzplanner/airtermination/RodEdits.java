package org.lpzplanner.airtermination;

import static org.lpzplanner.airtermination.PartsView.round;

import java.math.BigDecimal;
import org.lpzplanner.editing.AuditLine;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.editing.SiteChange;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;

/**
 * Adds, moves (or changes the height of) and removes one rod of a stored GeoJSON site file: each a
 * change given to the {@link EditPipeline}, which stores it, keeps the earlier file, audits it and
 * analyses the site again. A bad value stores nothing and names the field.
 */
@Service
public class RodEdits {

    private final EditPipeline edits;

    public RodEdits(EditPipeline edits) {
        this.edits = edits;
    }

    /**
     * Adds a rod at (x, y) local metres.
     *
     * @return the edit, whose outcome is the new rod's id
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a value is missing or unusable, or the file is WKT
     * @throws org.lpzplanner.engine.io.SiteFormatException when the changed file is not a valid site
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer at
     *         {@code expectedVersion}
     */
    public Edit<String> add(long siteId, long expectedVersion, RodInput input) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            if (input.x() == null || input.y() == null) {
                throw new InvalidInputException(input.x() == null ? "x" : "y", "x and y (local metres) are required");
            }
            BigDecimal height = PartChecks.height(input.height() == null ? "1" : input.height());
            PartChecks.checkName(input.name());
            String id = PartChecks.newId(PartChecks.usedIds(document.site()), input.id(), "rod");
            editor.add(id, input.name(), input.x(), input.y(), height);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("rod-added", "rod " + id
                    + (input.name() == null || input.name().isBlank() ? "" : " \"" + input.name().strip() + "\"")
                    + " at x " + round(input.x()) + " m, y " + round(input.y()) + " m, height "
                    + height.toPlainString() + " m"), id);
        });
    }

    /**
     * Moves a rod to (x, y) local metres and/or changes its height.
     *
     * @return the edit, whose outcome is the rod as it was before the change
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id or the site no rod
     *         with this id
     */
    public Edit<PartsView.RodView> change(long siteId, long expectedVersion, String rodId, RodInput input) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            if ((input.x() == null) != (input.y() == null)) {
                throw new InvalidInputException(input.x() == null ? "x" : "y", "give both x and y to move a rod");
            }
            if (input.x() == null && input.height() == null) {
                throw new InvalidInputException("x", "give x and y, a height, or both");
            }
            BigDecimal height = input.height() == null ? null : PartChecks.height(input.height());
            int index = PartChecks.rodIndex(site, document.site(), rodId);
            PartsView.RodView before = PartsView.view(document.site().rods().get(index), document.projection());
            editor.change(index, input.x(), input.y(), height);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("rod-changed", "rod " + rodId
                    + (input.x() == null ? "" : " moved from x " + before.x() + " m, y " + before.y() + " m to x "
                            + round(input.x()) + " m, y " + round(input.y()) + " m")
                    + (height == null ? "" : " height " + before.height() + " m to " + height.toPlainString() + " m")),
                    before);
        });
    }

    /**
     * Removes a rod.
     *
     * @return the edit, whose outcome is the rod as it was, so that it can be put back
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id or the site no rod
     *         with this id
     */
    public Edit<PartsView.RodView> remove(long siteId, long expectedVersion, String rodId) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            int index = PartChecks.rodIndex(site, document.site(), rodId);
            PartsView.RodView before = PartsView.view(document.site().rods().get(index), document.projection());
            editor.remove(index);
            return new SiteChange.Changed<>(editor.text(), AuditLine.of("rod-removed", "rod " + rodId + " at x "
                    + before.x() + " m, y " + before.y() + " m"), before);
        });
    }
}
