package org.lpzplanner.accounts;

import java.security.MessageDigest;
import java.security.SecureRandom;
import java.nio.charset.StandardCharsets;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.stereotype.Component;

/**
 * The one-time setup page creates the first administrator. On the machine the app runs on it asks
 * nothing more; from any other address it also asks for this code, which the app prints to its log
 * while no account exists, so that a stranger who reaches a fresh server first cannot take it over.
 */
@Component
public class SetupCode {

    private static final Logger LOG = LoggerFactory.getLogger(SetupCode.class);
    private static final String ALPHABET = "ABCDEFGHJKLMNPQRSTUVWXYZ23456789";

    private final String code;
    private final AccountService accounts;

    public SetupCode(AccountService accounts) {
        this.accounts = accounts;
        SecureRandom random = new SecureRandom();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 12; i++) {
            b.append(ALPHABET.charAt(random.nextInt(ALPHABET.length())));
        }
        this.code = b.toString();
    }

    @EventListener(ApplicationReadyEvent.class)
    void announce() {
        if (accounts.needsSetup()) {
            LOG.info("No account exists yet: open /setup in a browser to create the first administrator"
                    + " (from another machine, enter the setup code {})", code);
        }
    }

    /** Whether a setup request from this address, with this code, may create the first administrator. */
    public boolean permits(String remoteAddress, String given) {
        return isLoopback(remoteAddress) || (given != null && MessageDigest.isEqual(
                code.getBytes(StandardCharsets.UTF_8), given.strip().toUpperCase(java.util.Locale.ROOT)
                        .getBytes(StandardCharsets.UTF_8)));
    }

    public static boolean isLoopback(String address) {
        return address != null && (address.startsWith("127.") || address.equals("::1")
                || address.equals("0:0:0:0:0:0:0:1"));
    }
}
