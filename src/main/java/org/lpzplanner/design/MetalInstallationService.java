package org.lpzplanner.design;

import java.time.Clock;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;

/**
 * The metal installations marked for a site (name, point in local metres with its height above
 * ground, and whether air or concrete and brick separate it from the protection system): the objects
 * the separation distances are checked to ({@link SeparationService}). Stored beside the site file.
 */
@Service
public class MetalInstallationService {

    private final SiteService sites;
    private final DesignRepository store;
    private final Clock clock;

    public MetalInstallationService(SiteService sites, DesignRepository store, Clock clock) {
        this.sites = sites;
        this.store = store;
        this.clock = clock;
    }

    /**
     * @param material {@code AIR} (default) or {@code CONCRETE_OR_BRICK}
     * @throws InvalidInputException when a value is missing or cannot be used, naming the field
     */
    public DesignRepository.Installation add(long siteId, String name, Double x, Double y, Double z, String material) {
        sites.get(siteId);
        if (name == null || name.isBlank() || name.strip().length() > 200) {
            throw new InvalidInputException("name", "give the installation a name of 1 to 200 characters");
        }
        for (Object[] f : new Object[][] {{"x", x}, {"y", y}, {"z", z}}) {
            Double v = (Double) f[1];
            if (v == null || !Double.isFinite(v)) {
                throw new InvalidInputException((String) f[0], f[0] + " is required, in metres");
            }
        }
        if (z < 0) {
            throw new InvalidInputException("z", "z is the height above ground and cannot be negative");
        }
        String m = material == null ? "AIR" : material.strip().toUpperCase(Locale.ROOT);
        if (!m.equals("AIR") && !m.equals("CONCRETE_OR_BRICK")) {
            throw new InvalidInputException("material", "material must be AIR or CONCRETE_OR_BRICK, got \"" + material + "\"");
        }
        long id = store.addInstallation(siteId, name.strip(), x, y, z, m, clock.instant());
        return new DesignRepository.Installation(id, name.strip(), x, y, z, m);
    }

    /** @throws SiteNotFoundException when the site has no installation with this id */
    public void remove(long siteId, long id) {
        sites.get(siteId);
        if (!store.removeInstallation(siteId, id)) {
            throw new SiteNotFoundException(siteId, "site " + siteId + " has no metal installation " + id);
        }
    }

    public List<DesignRepository.Installation> list(long siteId) {
        sites.get(siteId);
        return store.installations(siteId);
    }
}
