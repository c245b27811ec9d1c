package org.lpzplanner.accounts;

import java.util.Optional;
import java.util.function.Supplier;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;

/**
 * Who is acting on this thread: the signed-in account of the request, or a named system task
 * (demo data, unattended setup) working for one team. Team ownership checks ask this; with
 * neither, they fail closed.
 */
public final class CurrentAccount {

    /** A task of the app itself acting for a team, e.g. loading the demo sites. */
    private record SystemActor(String name, long teamId) {
    }

    private static final ThreadLocal<SystemActor> SYSTEM = new ThreadLocal<>();

    private CurrentAccount() {
    }

    /** The signed-in account of this thread's request, if any. */
    public static Optional<SignedInAccount> signedIn() {
        Authentication auth = SecurityContextHolder.getContext().getAuthentication();
        if (auth != null && auth.getPrincipal() instanceof SignedInAccount account) {
            return Optional.of(account);
        }
        return Optional.empty();
    }

    /**
     * The team whose sites this thread may see.
     *
     * @throws AccessDeniedException when nobody is signed in and no system task runs
     */
    public static long teamId() {
        SystemActor system = SYSTEM.get();
        if (system != null) {
            return system.teamId();
        }
        return signedIn().orElseThrow(() -> new AccessDeniedException("nobody is signed in")).teamId();
    }

    /** The name the audit trail records: the account's e-mail or the system task's name. */
    public static String actorName() {
        SystemActor system = SYSTEM.get();
        if (system != null) {
            return system.name();
        }
        return signedIn().map(SignedInAccount::email).orElse("anonymous");
    }

    /**
     * Wraps work to run on another thread (a worker pool) as whoever acts on this thread now: the
     * signed-in account's security context, or the system task. Without it the team check on the
     * other thread fails closed.
     */
    public static <T> Supplier<T> carry(Supplier<T> work) {
        SecurityContext context = SecurityContextHolder.getContext();
        SystemActor system = SYSTEM.get();
        return () -> {
            SecurityContext previousContext = SecurityContextHolder.getContext();
            SystemActor previousSystem = SYSTEM.get();
            SecurityContextHolder.setContext(context);
            if (system != null) {
                SYSTEM.set(system);
            }
            try {
                return work.get();
            } finally {
                SecurityContextHolder.setContext(previousContext);
                if (previousSystem == null) {
                    SYSTEM.remove();
                } else {
                    SYSTEM.set(previousSystem);
                }
            }
        };
    }

    /** {@link #carry(Supplier)} for work without a result, e.g. {@code pool.execute(CurrentAccount.carry(task))}. */
    public static Runnable carry(Runnable work) {
        Supplier<Void> carried = carry(() -> {
            work.run();
            return null;
        });
        return carried::get;
    }

    /** Runs a task of the app itself for one team, e.g. storing the demo sites. */
    public static <T> T asSystem(String name, long teamId, Supplier<T> work) {
        SystemActor previous = SYSTEM.get();
        SYSTEM.set(new SystemActor(name, teamId));
        try {
            return work.get();
        } finally {
            if (previous == null) {
                SYSTEM.remove();
            } else {
                SYSTEM.set(previous);
            }
        }
    }
}
