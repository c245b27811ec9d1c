/**
 * Whole-site export and import: every per-site table in one file; an import is checked like uploads,
 * every revision analysed again from its own site file and settings, and stored in one transaction.
 *
 * <p>Rules of the package: never trusts a result or verdict from the file.
 */
package org.lpzplanner.transfer;
