package org.lpzplanner.persistence;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.securityContext;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Analyses of one site racing each other: each is stored as its own revision or told 409 (the site
 * changed meanwhile), never a server error, and the revisions stay numbered without gaps or repeats.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ConcurrentSavesTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    JdbcClient jdbc;

    @Test
    void racingAnalysesAreStoredOrToldConflictNeverFail() throws Exception {
        long id = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Race yard", null,
                null).id();
        // the racing requests come from threads of their own, which do not inherit the test's sign-in
        SecurityContext signedIn = SecurityContextHolder.getContext();
        int threads = 4;
        CountDownLatch go = new CountDownLatch(1);
        ConcurrentLinkedQueue<Integer> statuses = new ConcurrentLinkedQueue<>();
        List<Thread> workers = new ArrayList<>();
        for (int t = 0; t < threads; t++) {
            Thread worker = new Thread(() -> {
                try {
                    go.await();
                    for (int i = 0; i < 5; i++) {
                        statuses.add(mvc.perform(post("/api/sites/" + id + "/analyses").param("resolution", "1")
                                        .with(securityContext(signedIn)))
                                .andReturn().getResponse().getStatus());
                    }
                } catch (Exception e) {
                    statuses.add(-1);
                }
            });
            worker.start();
            workers.add(worker);
        }
        go.countDown();
        for (Thread worker : workers) {
            worker.join(120_000);
        }
        assertThat(statuses).hasSize(threads * 5).allSatisfy(s -> assertThat(s).isIn(201, 409));
        long stored = statuses.stream().filter(s -> s == 201).count();
        List<Integer> revisions = jdbc.sql("SELECT revision FROM analysis_revisions WHERE site_id = ? ORDER BY revision")
                .param(id).query(Integer.class).list();
        assertThat(revisions).hasSize((int) stored);
        for (int i = 0; i < revisions.size(); i++) {
            assertThat(revisions.get(i)).isEqualTo(i + 1);
        }
        assertThat(sites.get(id).version()).isEqualTo(stored);
    }
}
