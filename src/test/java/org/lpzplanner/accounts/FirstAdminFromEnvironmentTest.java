package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.crypto.password.PasswordEncoder;

/** LPZ_ADMIN_EMAIL and LPZ_ADMIN_PASSWORD (here as the properties they bind to) create the first administrator. */
@SpringBootTest(properties = {"lpz.admin.email=Ops@Example.org", "lpz.admin.password=unattended install secret",
    "lpz.admin.team=Operations"})
class FirstAdminFromEnvironmentTest {

    @Autowired
    AccountService accounts;

    @Autowired
    PasswordEncoder encoder;

    @Test
    void theAdministratorExistsAndTheSetupPageIsClosed() {
        assertThat(accounts.needsSetup()).isFalse();
        Account admin = accounts.list().stream().filter(a -> a.email().equals("ops@example.org")).findFirst()
                .orElseThrow();
        assertThat(admin.role()).isEqualTo(Role.ADMIN);
        assertThat(encoder.matches("unattended install secret", admin.passwordHash())).isTrue();
        assertThat(accounts.team(admin.teamId()).name()).isEqualTo("Operations");
    }
}
