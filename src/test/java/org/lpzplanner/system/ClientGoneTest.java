package org.lpzplanner.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.boot.test.system.CapturedOutput;
import org.springframework.boot.test.system.OutputCaptureExtension;
import org.springframework.util.unit.DataSize;
import org.springframework.web.context.request.async.AsyncRequestNotUsableException;

/**
 * A client that closes its connection before the answer is written is not a failure of the app:
 * one INFO line, no stack trace at ERROR. A real failure still is one.
 */
@ExtendWith(OutputCaptureExtension.class)
class ClientGoneTest {

    private final ApiErrorHandler handler = new ApiErrorHandler(new UploadLimit(DataSize.ofMegabytes(10)));

    @Test
    void aClosedConnectionIsOneInfoLine(CapturedOutput output) {
        IOException pipe = new IOException("Broken pipe");
        assertThat(handler.other(new AsyncRequestNotUsableException("ServletOutputStream failed to write", pipe)))
                .isNull();
        assertThat(handler.other(new RuntimeException("writing the answer", new IOException("Connection reset by peer"))))
                .isNull();
        assertThat(output.getOut() + output.getErr()).contains("Client went away").doesNotContain("ERROR")
                .doesNotContain("at org.");
    }

    @Test
    void aRealFailureIsStillAnErrorWith500(CapturedOutput output) {
        var answer = handler.other(new IllegalStateException("a bug"));
        assertThat(answer.getStatusCode().value()).isEqualTo(500);
        assertThat(ApiErrorHandler.clientWentAway(new IOException("disk full"))).isFalse();
        assertThat(output.getOut() + output.getErr()).contains("ERROR").contains("Unexpected failure");
    }
}
