package org.lpzplanner.bench;

import java.io.InputStream;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.lpzplanner.LpzPlannerApplication;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.airtermination.RodEdits;
import org.lpzplanner.airtermination.RodInput;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.transfer.SiteTransferService;
import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.core.io.Resource;
import org.springframework.core.io.support.PathMatchingResourcePatternResolver;

/**
 * Times importing site exports, which analyses every revision again: each demo site as the demo
 * data store it (level II, the resolution the engine chooses, one revision), then the campus demo
 * site with more revisions, each after one more rod was added (as a designer works). Median of 3
 * imports after two warm-up imports, through the app's services on an in-memory H2 database (the web
 * server starts on a free port but is not used).
 * Prints a Markdown table; numbers go into docs/reliability.md.
 */
public final class ImportBenchmark {

    private static final int RUNS = 3;
    private static final int WARM_UPS = 2;
    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();

    private ImportBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        try (ConfigurableApplicationContext app = new SpringApplicationBuilder(LpzPlannerApplication.class)
                .web(WebApplicationType.SERVLET)
                .properties("server.port=0", "lpz.demo-data=false", "spring.main.banner-mode=off", "logging.level.root=WARN",
                        "lpz.data-dir=target/bench-data",
                        "spring.datasource.url=jdbc:h2:mem:lpz-import-bench;DB_CLOSE_DELAY=-1")
                .run()) {
            long team = app.getBean(AccountService.class).defaultTeam().id();
            CurrentAccount.asSystem("import benchmark", team, () -> {
                run(app);
                return null;
            });
        }
    }

    private static void run(ConfigurableApplicationContext app) {
        SiteService sites = app.getBean(SiteService.class);
        AnalysisService analyses = app.getBean(AnalysisService.class);
        RodEdits rods = app.getBean(RodEdits.class);
        SiteTransferService transfers = app.getBean(SiteTransferService.class);
        System.out.printf("load average at start: %.1f on %d cores%n", OS.getSystemLoadAverage(),
                OS.getAvailableProcessors());
        System.out.println("| site | revisions | export KB | import ms (median of " + RUNS
                + ") | per revision ms | CPU ms (all threads) |");
        System.out.println("|---|---|---|---|---|---|");
        long campus = 0;
        for (Resource file : demoFiles()) {
            long id = sites.create(file.getFilename(), bytes(file), null, "II", null).id();
            analyses.run(id, null, null, null);
            print(sites.get(id).name(), 1, transfers.export(id).content(), transfers);
            if (file.getFilename().startsWith("brookfield")) {
                campus = id;
            }
        }
        int revisions = 1;
        for (int target : List.of(4, 8)) {
            while (revisions < target) {
                // the edit analyses the site again: one revision per rod
                rods.add(campus, sites.get(campus).version(), new RodInput(null, "Mast " + revisions,
                        -60.0 + 15 * revisions, 10.0, "4"));
                revisions++;
            }
            print(sites.get(campus).name() + ", a rod added before each revision", revisions,
                    transfers.export(campus).content(), transfers);
        }
        System.out.printf("load average now: %.1f%n", OS.getSystemLoadAverage());
    }

    private static void print(String site, int revisions, byte[] export, SiteTransferService transfers) {
        for (int i = 0; i < WARM_UPS; i++) {
            transfers.importSite(export);
        }
        long[] millis = new long[RUNS];
        long[] cpu = new long[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long cpu0 = OS.getProcessCpuTime();
            long start = System.nanoTime();
            transfers.importSite(export);
            millis[i] = (System.nanoTime() - start) / 1_000_000;
            cpu[i] = (OS.getProcessCpuTime() - cpu0) / 1_000_000;
        }
        long median = median(millis);
        System.out.printf("| %s | %d | %d | %,d | %,d | %,d |%n", site, revisions, export.length / 1024, median,
                median / revisions, median(cpu));
    }

    private static long median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }

    private static List<Resource> demoFiles() {
        try {
            Resource[] files = new PathMatchingResourcePatternResolver().getResources("classpath*:demo/*");
            return Arrays.stream(files).sorted(Comparator.comparing(r -> String.valueOf(r.getFilename()))).toList();
        } catch (java.io.IOException e) {
            throw new IllegalStateException("demo sites are packaged with the app", e);
        }
    }

    private static byte[] bytes(Resource file) {
        try (InputStream in = file.getInputStream()) {
            return in.readAllBytes();
        } catch (java.io.IOException e) {
            throw new IllegalStateException("cannot read demo site " + file.getFilename(), e);
        }
    }
}
