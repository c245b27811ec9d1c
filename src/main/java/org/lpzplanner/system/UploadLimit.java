package org.lpzplanner.system;

import java.util.Locale;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Component;
import org.springframework.util.unit.DataSize;
import org.springframework.web.servlet.ModelAndView;

/** The upload size limit ({@code spring.servlet.multipart.max-file-size}) and the words for going over it. */
@Component
public class UploadLimit {

    private final DataSize maxFileSize;

    public UploadLimit(@Value("${spring.servlet.multipart.max-file-size:1MB}") DataSize maxFileSize) {
        this.maxFileSize = maxFileSize;
    }

    /** "the file is larger than the upload limit of 10 MB; nothing was stored…" */
    public String message() {
        return "the file is larger than the upload limit of " + megabytes(maxFileSize.toBytes())
                + "; nothing was stored. Leave out what the assessment does not need, or split the site into"
                + " several files";
    }

    /** The 413 page of a browser upload over the limit, saying the limit. */
    public ModelAndView refusedPage() {
        ModelAndView page = new ModelAndView("sites/upload-refused", HttpStatus.CONTENT_TOO_LARGE);
        page.addObject("reason", message());
        return page;
    }

    static String megabytes(long bytes) {
        double mb = bytes / (1024.0 * 1024.0);
        return (mb == Math.rint(mb) ? String.valueOf((long) mb) : String.format(Locale.ROOT, "%.1f", mb)) + " MB";
    }
}
