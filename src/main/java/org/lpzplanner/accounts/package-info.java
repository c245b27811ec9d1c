/**
 * Who may do what: sign-in, the first-start setup, roles (administrator, designer, reviewer), teams,
 * personal API tokens, sign-in limits and the security headers (docs/security.md);
 * {@link org.lpzplanner.accounts.CurrentAccount} is who acts on this thread.
 *
 * <p>Rules of the package: depends on system only; every other feature asks it who acts and for
 * which team, and never reads accounts' tables itself.
 */
package org.lpzplanner.accounts;
