package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.context.SecurityContextHolder;

/** Who acts: the signed-in account, a system task, or nobody (then team checks fail closed). */
class CurrentAccountTest {

    @AfterEach
    void signOut() {
        SecurityContextHolder.clearContext();
    }

    @Test
    void withNobodySignedInTheTeamCheckFailsClosed() {
        assertThatThrownBy(CurrentAccount::teamId).isInstanceOf(AccessDeniedException.class);
        assertThat(CurrentAccount.asSystem("demo data", 7, CurrentAccount::teamId)).isEqualTo(7L);
        assertThat(CurrentAccount.asSystem("demo data", 7, CurrentAccount::actorName)).isEqualTo("demo data");
        assertThatThrownBy(CurrentAccount::teamId).as("the system task ended").isInstanceOf(AccessDeniedException.class);
    }

    @Test
    void carriedWorkActsAsTheCallerOnAnotherThreadAndLeavesThatThreadClean() throws Exception {
        SignedInAccount designer = new SignedInAccount(3, "d@example.org", "D", Role.DESIGNER, 42, true, null);
        SecurityContextHolder.getContext().setAuthentication(
                UsernamePasswordAuthenticationToken.authenticated(designer, null, designer.getAuthorities()));
        ExecutorService pool = Executors.newSingleThreadExecutor();
        try {
            long[] seen = new long[1];
            pool.submit(CurrentAccount.carry(() -> {
                seen[0] = CurrentAccount.teamId();
            })).get(10, TimeUnit.SECONDS);
            assertThat(seen[0]).isEqualTo(42);
            // the pool thread holds nobody afterwards, so the next task of another person starts clean
            assertThatThrownBy(() -> pool.submit(CurrentAccount::teamId).get(10, TimeUnit.SECONDS))
                    .hasCauseInstanceOf(AccessDeniedException.class);
        } finally {
            pool.shutdownNow();
        }
    }
}
