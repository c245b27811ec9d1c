package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * The options tried, from no LPS through protection levels IV, III, II to I, and the first whose R1
 * is tolerable.
 *
 * @param options one {@link LifeRisk} per option, in the order tried
 */
public record LevelChoice(List<LifeRisk> options) {

    public LevelChoice {
        options = List.copyOf(options);
    }

    /** The first tolerable option, or empty when even level I leaves R1 above the tolerable risk. */
    public Optional<LifeRisk> chosen() {
        return options.stream().filter(LifeRisk::isTolerable).findFirst();
    }

    /** True when an LPS is needed and one of the levels suffices. */
    public boolean needsLps() {
        return chosen().map(r -> r.level() != null).orElse(true);
    }

    /** The lowest sufficient protection level; empty when no LPS is needed or none suffices. */
    public Optional<ProtectionLevel> level() {
        return chosen().map(LifeRisk::level);
    }

    /** The outcome in plain words, followed by the figures of the chosen (or strongest) option. */
    public List<String> summary() {
        List<String> lines = new ArrayList<>();
        Optional<LifeRisk> c = chosen();
        if (c.isEmpty()) {
            lines.add("Even an LPS of protection level I leaves R1 above the tolerable risk: add further measures "
                    + "(touch and step protection, fire provisions, better SPDs or screened lines at the line entries)"
                    + " and assess again.");
            lines.addAll(options.get(options.size() - 1).explanation());
        } else if (c.get().level() == null) {
            lines.add("R1 is tolerable without an LPS.");
            lines.addAll(c.get().explanation());
        } else {
            lines.add("The lowest protection level that makes R1 tolerable is " + c.get().level().name()
                    + (c.get().lines().isEmpty() ? "." : ", with every incoming line bonded at its entry through SPDs"
                            + " for that level (at least)."));
            lines.addAll(c.get().explanation());
        }
        return lines;
    }
}
