package org.lpzplanner.bench;

import java.io.InputStream;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.LpzPlannerApplication;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.airtermination.AirTerminationApiController;
import org.lpzplanner.airtermination.PartsView;
import org.lpzplanner.airtermination.RodRequest;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.plan.SitePageController;
import org.lpzplanner.sites.SiteService;
import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.core.io.ClassPathResource;
import org.springframework.ui.ExtendedModelMap;

/**
 * Times one rod move on the campus demo site as the plan editor sends it (the JSON API's handler:
 * the file changed, the site analysed again from the last analysis, the plan drawn and worded, the
 * parts listed), and one view of the plan page after it. Median of 15 after 5 warm-up moves, through
 * the app's beans on an in-memory H2 database (the web server starts on a free port but is not used).
 */
public final class RodMoveBenchmark {

    private static final int RUNS = 15;
    private static final int WARM_UPS = 5;

    private RodMoveBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        try (ConfigurableApplicationContext app = new SpringApplicationBuilder(LpzPlannerApplication.class)
                .web(WebApplicationType.SERVLET)
                .properties("server.port=0", "lpz.demo-data=false", "spring.main.banner-mode=off",
                        "logging.level.root=WARN", "lpz.data-dir=target/bench-data",
                        "spring.datasource.url=jdbc:h2:mem:lpz-rod-move-bench;DB_CLOSE_DELAY=-1")
                .run()) {
            long team = app.getBean(AccountService.class).defaultTeam().id();
            CurrentAccount.asSystem("rod move benchmark", team, () -> {
                run(app);
                return null;
            });
        }
    }

    private static void run(ConfigurableApplicationContext app) {
        SiteService sites = app.getBean(SiteService.class);
        AirTerminationApiController api = app.getBean(AirTerminationApiController.class);
        SitePageController pages = app.getBean(SitePageController.class);
        byte[] campus;
        try (InputStream in = new ClassPathResource("demo/brookfield-campus.geojson").getInputStream()) {
            campus = in.readAllBytes();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        long id = app.getBean(EditPipeline.class).upload("brookfield-campus.geojson", campus, null, "II", null).siteId();
        PartsView.RodView rod = app.getBean(PartsView.class).parts(id).rods().get(0);
        List<Long> moves = new ArrayList<>();
        List<Long> views = new ArrayList<>();
        for (int k = 0; k < WARM_UPS + RUNS; k++) {
            double x = rod.x() + (k % 2 == 0 ? 0.5 : 0);
            RodRequest body = new RodRequest(sites.get(id).version(), null, null, String.valueOf(x),
                    String.valueOf(rod.y()), null);
            long start = System.nanoTime();
            api.change(id, rod.id(), body, Locale.ENGLISH);
            long moved = System.nanoTime();
            pages.plan(id, new ExtendedModelMap(), Locale.ENGLISH);
            long viewed = System.nanoTime();
            if (k >= WARM_UPS) {
                moves.add((moved - start) / 1_000_000);
                views.add((viewed - moved) / 1_000);
            }
        }
        System.out.println("| step | median | min | max |");
        System.out.println("|---|---|---|---|");
        System.out.println("| rod move, answered (ms) | " + median(moves) + " | " + Collections.min(moves) + " | "
                + Collections.max(moves) + " |");
        System.out.println("| plan page view (µs) | " + median(views) + " | " + Collections.min(views) + " | "
                + Collections.max(views) + " |");
    }

    private static long median(List<Long> values) {
        List<Long> sorted = new ArrayList<>(values);
        Collections.sort(sorted);
        return sorted.get(sorted.size() / 2);
    }
}
