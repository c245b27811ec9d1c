package org.lpzplanner.system;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Marks a page controller whose failures are shown as pages of their own ({@link PageErrors}): a
 * not-found page, a page saying why a request could not be done, the upload-limit page. A feature
 * puts it on its page controllers; nothing here needs to know them.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
public @interface SitePages {
}
