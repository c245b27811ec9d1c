/**
 * The invented demo sites loaded on the first start, stored and analysed as any upload (through
 * {@link org.lpzplanner.editing.EditPipeline}).
 *
 * <p>Rules of the package: the top of the product; nothing depends on it.
 */
package org.lpzplanner.demo;
