package org.lpzplanner.demo;

import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;
import java.util.Comparator;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.core.io.Resource;
import org.springframework.core.io.support.PathMatchingResourcePatternResolver;
import org.springframework.stereotype.Component;

/**
 * On a first start (no site stored) stores every demo site packaged under {@code demo/} on the
 * classpath and analyses each at protection level II, as any upload ({@link EditPipeline}), so that
 * a new user sees worked examples at once. They belong to the default team, the team of the first administrator. Off with {@code lpz.demo-data=false}. A demo file that fails is logged and skipped.
 */
@Component
@ConditionalOnProperty(name = "lpz.demo-data", havingValue = "true", matchIfMissing = true)
public class DemoData implements ApplicationRunner {

    private static final Logger LOG = LoggerFactory.getLogger(DemoData.class);

    /** The name the audit trail records for the demo sites. */
    static final String ACTOR = "demo data";

    private final SiteService sites;
    private final EditPipeline edits;
    private final AccountService accounts;

    public DemoData(SiteService sites, EditPipeline edits, AccountService accounts) {
        this.sites = sites;
        this.edits = edits;
        this.accounts = accounts;
    }

    @Override
    public void run(ApplicationArguments args) throws IOException {
        if (sites.count() > 0) {
            return;
        }
        long team = accounts.defaultTeam().id();
        Resource[] files = new PathMatchingResourcePatternResolver().getResources("classpath*:demo/*");
        Arrays.sort(files, Comparator.comparing(r -> String.valueOf(r.getFilename())));
        for (Resource file : files) {
            String name = file.getFilename();
            if (name == null || !(name.endsWith(".geojson") || name.endsWith(".json") || name.endsWith(".wkt"))) {
                continue;
            }
            try (InputStream in = file.getInputStream()) {
                byte[] content = in.readAllBytes();
                Edit<StoredSite> upload = CurrentAccount.asSystem(ACTOR, team,
                        () -> edits.upload(name, content, null, "II", null));
                if (upload.analysis().isPending()) {
                    LOG.warn("Demo site {} from {} stored, not analysed yet: {}", upload.outcome().name(), name,
                            upload.analysis().pendingReason());
                } else {
                    LOG.info("Stored demo site {} from {}", upload.outcome().name(), name);
                }
            } catch (RuntimeException e) {
                LOG.warn("Demo site {} skipped: {}", name, e.getMessage());
            }
        }
    }
}
