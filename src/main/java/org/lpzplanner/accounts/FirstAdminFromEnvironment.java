package org.lpzplanner.accounts;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;

/**
 * Unattended installs: with {@code LPZ_ADMIN_EMAIL} and {@code LPZ_ADMIN_PASSWORD} set (properties
 * {@code lpz.admin.email}, {@code lpz.admin.password}; optional {@code LPZ_ADMIN_NAME},
 * {@code LPZ_ADMIN_TEAM}) the first start creates that administrator, so the setup page is never
 * open. Ignored once any account exists. Unusable values stop the start with the reason, rather
 * than leave the setup page open on a server meant to be configured.
 */
@Component
@Order(Ordered.HIGHEST_PRECEDENCE)
public class FirstAdminFromEnvironment implements ApplicationRunner {

    private static final Logger LOG = LoggerFactory.getLogger(FirstAdminFromEnvironment.class);

    private final AccountService accounts;
    private final String email;
    private final String password;
    private final String name;
    private final String team;

    public FirstAdminFromEnvironment(AccountService accounts, @Value("${lpz.admin.email:}") String email,
            @Value("${lpz.admin.password:}") String password, @Value("${lpz.admin.name:}") String name,
            @Value("${lpz.admin.team:}") String team) {
        this.accounts = accounts;
        this.email = email;
        this.password = password;
        this.name = name;
        this.team = team;
    }

    @Override
    public void run(ApplicationArguments args) {
        if (email.isBlank() && password.isBlank()) {
            return;
        }
        if (!accounts.needsSetup()) {
            LOG.info("LPZ_ADMIN_EMAIL is set but accounts exist already; nothing to do");
            return;
        }
        if (email.isBlank() || password.isBlank()) {
            throw new IllegalStateException("set both LPZ_ADMIN_EMAIL and LPZ_ADMIN_PASSWORD, or neither");
        }
        try {
            Account admin = accounts.createFirstAdmin(email, name, password, team);
            LOG.info("Created the first administrator {} from LPZ_ADMIN_EMAIL", admin.email());
        } catch (SetupDoneException e) {
            LOG.info("Another instance created the first administrator meanwhile");
        } catch (org.lpzplanner.system.InvalidInputException e) {
            throw new IllegalStateException("LPZ_ADMIN_" + e.field().toUpperCase(java.util.Locale.ROOT)
                    + ": " + e.getMessage(), e);
        }
    }
}
