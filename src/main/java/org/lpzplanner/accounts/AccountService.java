package org.lpzplanner.accounts;

import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Creates and manages accounts and teams. Passwords are checked for length here and stored only
 * as an adaptive hash (see {@link SecurityConfiguration#passwordEncoder()}).
 */
@Service
public class AccountService {

    /** Shortest password accepted; length beats composition rules (NIST SP 800-63B, 5.1.1.2). */
    public static final int MIN_PASSWORD = 12;
    /** Longest password accepted, so that hashing stays cheap to refuse. */
    public static final int MAX_PASSWORD = 200;

    private final AccountRepository accounts;
    private final ApiTokenService tokens;
    private final PasswordEncoder encoder;
    private final Clock clock;

    public AccountService(AccountRepository accounts, ApiTokenService tokens, PasswordEncoder encoder, Clock clock) {
        this.accounts = accounts;
        this.tokens = tokens;
        this.encoder = encoder;
        this.clock = clock;
    }

    /** Whether the first administrator still has to be created. */
    public boolean needsSetup() {
        return accounts.countAccounts() == 0;
    }

    /**
     * Creates the first administrator, in the default team (which owns the demo sites); refused
     * once any account exists. Serialised on the teams row so two simultaneous setups cannot both
     * succeed, even on two app instances.
     *
     * @throws SetupDoneException    when an account exists already
     * @throws InvalidInputException when a value cannot be used
     */
    @Transactional
    public Account createFirstAdmin(String email, String displayName, String password, String teamName) {
        Team team = accounts.defaultTeam();
        accounts.lockTeam(team.id());
        if (accounts.countAccounts() > 0) {
            throw new SetupDoneException();
        }
        if (teamName != null && !teamName.isBlank()) {
            accounts.renameTeam(team.id(), checkTeamName(teamName));
        }
        return create(email, displayName, password, Role.ADMIN, team.id());
    }

    /**
     * Creates an account.
     *
     * @throws InvalidInputException when a value cannot be used or the e-mail is taken
     */
    @Transactional
    public Account create(String email, String displayName, String password, Role role, long teamId) {
        String mail = checkEmail(email);
        String name = displayName == null || displayName.isBlank() ? mail : displayName.strip();
        if (name.length() > 200) {
            throw new InvalidInputException("name", "name must be at most 200 characters");
        }
        checkPassword(password);
        if (role == null) {
            throw new InvalidInputException("role", "role must be one of ADMIN, DESIGNER, REVIEWER");
        }
        team(teamId);
        if (accounts.findByEmail(mail).isPresent()) {
            throw new InvalidInputException("email", "an account with the e-mail " + mail + " exists already");
        }
        try {
            return accounts.insert(mail, name, encoder.encode(password), role, teamId, now());
        } catch (DuplicateKeyException e) {
            throw new InvalidInputException("email", "an account with the e-mail " + mail + " exists already");
        }
    }

    /**
     * Changes an account's role, team or whether it may sign in, and ends the account's sessions on
     * every instance when any of them changed. Disabling an account also revokes its API tokens, so
     * enabling it again brings none back. The last enabled administrator cannot be demoted or
     * disabled, so the app always has someone who can manage accounts. (API tokens look the
     * account up on every request, so they follow a new role or team by themselves.)
     */
    @Transactional
    public Account update(long accountId, Role role, long teamId, boolean enabled) {
        Account account = get(accountId);
        if (role == null) {
            throw new InvalidInputException("role", "role must be one of ADMIN, DESIGNER, REVIEWER");
        }
        team(teamId);
        boolean losesAdmin = account.role() == Role.ADMIN && account.enabled() && (role != Role.ADMIN || !enabled);
        if (losesAdmin && accounts.countEnabledAdmins() <= 1) {
            throw new InvalidInputException("role", "the last administrator must stay an enabled administrator");
        }
        accounts.update(accountId, role, teamId, enabled);
        if (role != account.role() || teamId != account.teamId() || enabled != account.enabled()) {
            // sessions keep the role and team they signed in with: end them, so the change counts at once
            accounts.endSessions(account.email());
        }
        if (account.enabled() && !enabled) {
            tokens.revokeAll(accountId);
        }
        return get(accountId);
    }

    /**
     * Sets a new password after checking the current one, ends every session of the account (the
     * one the change was made in too) and revokes its API tokens. People change a password mostly
     * because it may be known to someone else, and whoever knew it could have opened sessions and
     * made tokens with it; both end with the old password.
     */
    @Transactional
    public void changePassword(long accountId, String current, String replacement) {
        Account account = get(accountId);
        if (current == null || !encoder.matches(current, account.passwordHash())) {
            throw new InvalidInputException("current", "the current password is not right");
        }
        checkPassword(replacement);
        accounts.updatePassword(accountId, encoder.encode(replacement));
        accounts.endSessions(account.email());
        tokens.revokeAll(accountId);
    }

    public Account get(long accountId) {
        return accounts.findById(accountId).orElseThrow(() -> new InvalidInputException("account",
                "there is no account " + accountId));
    }

    public List<Account> list() {
        return accounts.findAll();
    }

    public List<Team> teams() {
        return accounts.findTeams();
    }

    public Team team(long teamId) {
        return accounts.findTeam(teamId).orElseThrow(() -> new InvalidInputException("team",
                "there is no team " + teamId));
    }

    /** The team of the demo sites and of the first administrator. */
    public Team defaultTeam() {
        return accounts.defaultTeam();
    }

    @Transactional
    public Team createTeam(String name) {
        String n = checkTeamName(name);
        if (accounts.findTeamByName(n).isPresent()) {
            throw new InvalidInputException("team", "a team named \"" + n + "\" exists already");
        }
        try {
            return accounts.insertTeam(n, now());
        } catch (DuplicateKeyException e) {
            // Another request created the same name (in any letter case) since the check above.
            throw new InvalidInputException("team", "a team named \"" + n + "\" exists already");
        }
    }

    private static String checkTeamName(String name) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty() || n.length() > 200) {
            throw new InvalidInputException("team", "the team name must have 1 to 200 characters");
        }
        return n;
    }

    /** Lower-cased, trimmed; one @ with text on both sides, no spaces. */
    static String checkEmail(String email) {
        String mail = email == null ? "" : email.strip().toLowerCase(Locale.ROOT);
        if (mail.length() > 254 || !mail.matches("[^@\\s]+@[^@\\s]+")) {
            throw new InvalidInputException("email", "enter an e-mail address such as name@example.org");
        }
        return mail;
    }

    static void checkPassword(String password) {
        if (password == null || password.length() < MIN_PASSWORD) {
            throw new InvalidInputException("password", "the password must have at least " + MIN_PASSWORD
                    + " characters");
        }
        if (password.length() > MAX_PASSWORD) {
            throw new InvalidInputException("password", "the password must have at most " + MAX_PASSWORD
                    + " characters");
        }
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MILLIS);
    }
}
