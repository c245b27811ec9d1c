package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.nio.ByteBuffer;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Thousands of generated bad site files: the reader refuses every one with a {@link SiteFormatException}
 * naming the feature and field at fault (never another exception, never acceptance). Replay one seed
 * with {@code -Dlpz.seed=N}.
 */
class SiteReaderFuzzProperties {

    static final int FILES_PER_SEED = 1000;

    static LongStream seeds() {
        String replay = System.getProperty("lpz.seed");
        if (replay != null && !replay.isBlank()) {
            return LongStream.of(Long.parseLong(replay.trim()));
        }
        return LongStream.of(20_260_101L, 20_260_102L, 20_260_103L, 20_260_104L);
    }

    @Test
    void theStartingSiteIsValid() {
        assertThat(SiteReader.readGeoJson(new String(BadSiteFiles.bytes(BadSiteFiles.valid()), StandardCharsets.UTF_8),
                "fuzz.geojson").site().structures()).hasSize(3);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void everyBadFileIsRefusedNamingFeatureAndField(long seed) {
        Random random = new Random(seed);
        for (int i = 0; i < FILES_PER_SEED; i++) {
            BadSiteFiles.Case c = BadSiteFiles.generate(random);
            String label = "seed " + seed + " file " + i + " (" + c.description() + ")";
            SiteFormatException e;
            try {
                String text = decode(c.content());
                SiteReader.readGeoJson(text, "fuzz.geojson");
                fail(label + " was accepted");
                return;
            } catch (SiteFormatException refused) {
                e = refused;
            } catch (RuntimeException other) {
                throw new AssertionError(label + " failed with " + other, other);
            }
            assertThat(e.getMessage()).as(label).startsWith("fuzz.geojson").doesNotContain("Exception");
            if (c.feature() >= 0) {
                assertThat(e.featureIndex()).as(label + ": " + e.getMessage()).isEqualTo(c.feature());
            }
            if (c.field() != null) {
                assertThat(e.field()).as(label + ": " + e.getMessage()).isEqualTo(c.field());
            }
        }
    }

    /** As the upload does: a file that is not UTF-8 is refused before the reader. */
    private static String decode(byte[] content) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(content)).toString();
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new SiteFormatException("fuzz.geojson", "the file is not UTF-8 text");
        }
    }
}
