package org.lpzplanner.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

@SpringBootTest(properties = "lpz.demo-data=true")
@SignedIn
class DemoDataTest {

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Test
    void firstStartStoresAndAnalysesOneSitePerSampleFile() throws IOException {
        long sampleFiles;
        try (Stream<Path> files = Files.list(Path.of("sample-sites"))) {
            sampleFiles = files.filter(p -> !p.getFileName().toString().endsWith(".md")).count();
        }

        assertThat(sites.count()).isEqualTo(sampleFiles);
        for (StoredSite site : sites.list()) {
            assertThat(site.level().name()).isEqualTo("II");
            assertThat(analyses.latest(site.id())).as(site.name()).isPresent();
        }
    }

    @Test
    void packagedDemoFilesMatchTheSampleSites() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("sample-sites"))) {
            for (Path sample : files.filter(p -> !p.getFileName().toString().endsWith(".md")).toList()) {
                Path packaged = Path.of("src", "main", "resources", "demo").resolve(sample.getFileName());
                assertThat(packaged).as("packaged copy of " + sample.getFileName()).hasSameBinaryContentAs(sample);
            }
        }
    }
}
