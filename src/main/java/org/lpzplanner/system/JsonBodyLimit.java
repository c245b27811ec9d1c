package org.lpzplanner.system;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.lang.reflect.Type;
import java.util.Locale;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.core.MethodParameter;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpInputMessage;
import org.springframework.http.converter.HttpMessageConverter;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.util.unit.DataSize;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.context.request.RequestAttributes;
import org.springframework.web.context.request.RequestContextHolder;
import org.springframework.web.servlet.mvc.method.annotation.RequestBodyAdviceAdapter;

/**
 * The size limit on JSON request bodies of the API ({@code lpz.api.json-body-limit}, 1 MiB by
 * default: far more than the largest body an endpoint needs, a few kilobytes). A body whose declared
 * length is over the limit is refused before a byte of it is read; one sent without a length is read
 * up to the limit and refused there. Either answers 413 naming the limit
 * ({@link JsonBodyTooLargeException}). The body read is kept with the request, so that a body the JSON
 * reader refuses for one of its own limits (nesting depth, length of a number) can be searched for the
 * member at fault ({@link JsonBodyErrors}).
 */
@ControllerAdvice(annotations = RestController.class)
public class JsonBodyLimit extends RequestBodyAdviceAdapter {

    /** The request attribute holding the bytes of the JSON body read. */
    static final String BODY = JsonBodyLimit.class.getName() + ".body";

    private static final long MIB = 1024 * 1024;

    private final long limit;

    public JsonBodyLimit(@Value("${lpz.api.json-body-limit:1MB}") DataSize limit) {
        this.limit = limit.toBytes();
    }

    @Override
    public boolean supports(MethodParameter parameter, Type targetType,
            Class<? extends HttpMessageConverter<?>> converterType) {
        return true;
    }

    @Override
    public HttpInputMessage beforeBodyRead(HttpInputMessage message, MethodParameter parameter, Type targetType,
            Class<? extends HttpMessageConverter<?>> converterType) throws IOException {
        long declared = message.getHeaders().getContentLength();
        if (declared > limit) {
            throw new JsonBodyTooLargeException("the request body of " + size(declared) + " is larger than the "
                    + size(limit) + " the API takes as JSON; nothing was changed. Send less at once");
        }
        byte[] body = readAtMostLimit(message);
        RequestAttributes request = RequestContextHolder.getRequestAttributes();
        if (request != null) {
            request.setAttribute(BODY, body, RequestAttributes.SCOPE_REQUEST);
        }
        HttpHeaders headers = message.getHeaders();
        return new HttpInputMessage() {
            @Override
            public InputStream getBody() {
                return new ByteArrayInputStream(body);
            }

            @Override
            public HttpHeaders getHeaders() {
                return headers;
            }
        };
    }

    private byte[] readAtMostLimit(HttpInputMessage message) {
        try (InputStream in = message.getBody()) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            byte[] chunk = new byte[8192];
            for (int n = in.read(chunk); n >= 0; n = in.read(chunk)) {
                out.write(chunk, 0, n);
                if (out.size() > limit) {
                    throw new JsonBodyTooLargeException("the request body is larger than the " + size(limit)
                            + " the API takes as JSON; nothing was changed. Send less at once");
                }
            }
            return out.toByteArray();
        } catch (IOException e) {
            throw new HttpMessageNotReadableException("the request body could not be read to its end", e, message);
        }
    }

    /** "1 MiB", "150 MiB", "1.5 MiB", "900 KiB", "12 bytes". */
    static String size(long bytes) {
        if (bytes >= MIB) {
            double mib = bytes / (double) MIB;
            return (mib == Math.rint(mib) ? String.valueOf((long) mib) : String.format(Locale.ROOT, "%.1f", mib))
                    + " MiB";
        }
        if (bytes >= 1024) {
            return String.format(Locale.ROOT, "%.0f KiB", bytes / 1024.0);
        }
        return bytes + " bytes";
    }
}
