package org.lpzplanner.airtermination;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.lpzplanner.editing.AuditLine;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.editing.SiteChange;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;

/**
 * Adds or removes many rods and conductors in one change of a stored GeoJSON site file (one earlier
 * file kept, one new version, one audit line), as an accepted proposal and its undo need: either all
 * of them are changed or, when one value is unusable or one part is missing, none.
 */
@Service
public class PartBatchEdits {

    private final EditPipeline edits;

    public PartBatchEdits(EditPipeline edits) {
        this.edits = edits;
    }

    /** Ids of the parts one change added, in the order given. */
    public record AddedParts(List<String> rodIds, List<String> conductorIds) {
    }

    /**
     * Adds rods and conductors in one change. Rods get the next free ids {@code rod-N}, conductors
     * {@code conductor-N}; names and heights as given (a rod without a height is 1 m high).
     *
     * @param audit what the audit trail records of the change
     * @return the edit, whose outcome is the new parts' ids
     * @throws InvalidInputException when there is nothing to add or a value is unusable, naming it
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer at
     *         {@code expectedVersion}
     */
    public Edit<AddedParts> add(long siteId, long expectedVersion, List<RodInput> rods, List<ConductorInput> conductors,
            AuditLine audit) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            if (rods.isEmpty() && conductors.isEmpty()) {
                throw new InvalidInputException("parts", "there are no parts to add");
            }
            Set<String> used = PartChecks.usedIds(document.site());
            List<String> rodIds = new ArrayList<>();
            for (int k = 0; k < rods.size(); k++) {
                RodInput input = rods.get(k);
                if (input.x() == null || input.y() == null) {
                    throw new InvalidInputException("rods[" + k + "]", "x and y (local metres) are required for every"
                            + " rod");
                }
                PartChecks.checkName(input.name());
                String id = PartChecks.newId(used, null, "rod");
                used.add(id);
                editor.add(id, input.name(), input.x(), input.y(),
                        PartChecks.height(input.height() == null ? "1" : input.height()));
                rodIds.add(id);
            }
            List<String> conductorIds = new ArrayList<>();
            for (ConductorInput input : conductors) {
                BigDecimal heightAboveRoof = PartChecks.checkedConductor(input);
                String id = PartChecks.newId(used, null, "conductor");
                used.add(id);
                editor.addConductor(id, input.name(), input.points(), heightAboveRoof);
                conductorIds.add(id);
            }
            return new SiteChange.Changed<>(editor.text(), audit, new AddedParts(rodIds, conductorIds));
        });
    }

    /**
     * Removes the given rods and conductors in one change; every id must still be in the site, else
     * nothing is removed.
     *
     * @param audit what the audit trail records of the change
     * @throws org.lpzplanner.sites.SiteNotFoundException when a part is no longer in the site
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer at
     *         {@code expectedVersion}
     */
    public Edit<Void> remove(long siteId, long expectedVersion, List<String> rodIds, List<String> conductorIds,
            AuditLine audit) {
        return edits.apply(siteId, expectedVersion, (site, document) -> {
            PartFileEditor editor = PartFileEditor.open(site, document);
            List<Integer> rodIndexes = new ArrayList<>();
            for (String id : rodIds) {
                rodIndexes.add(PartChecks.rodIndex(site, document.site(), id));
            }
            List<Integer> conductorIndexes = new ArrayList<>();
            for (String id : conductorIds) {
                conductorIndexes.add(PartChecks.conductorIndex(site, document.site(), id));
            }
            // from the last to the first, so that the indexes still to remove stay valid
            rodIndexes.stream().distinct().sorted(Comparator.reverseOrder()).forEach(editor::remove);
            conductorIndexes.stream().distinct().sorted(Comparator.reverseOrder()).forEach(editor::removeConductor);
            return new SiteChange.Changed<>(editor.text(), audit, null);
        });
    }
}
