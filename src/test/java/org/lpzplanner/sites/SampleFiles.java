package org.lpzplanner.sites;

import java.nio.file.Files;
import java.nio.file.Path;
import org.springframework.mock.web.MockMultipartFile;

/** The invented demo site files of {@code sample-sites/}, as multipart uploads for tests. */
public final class SampleFiles {

    private static final Path SAMPLES = Path.of("sample-sites");

    private SampleFiles() {
    }

    /** The sample file as the {@code file} part of an upload form. */
    public static MockMultipartFile sample(String fileName) throws Exception {
        return new MockMultipartFile("file", fileName, "application/octet-stream",
                Files.readAllBytes(SAMPLES.resolve(fileName)));
    }
}
