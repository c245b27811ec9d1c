package org.lpzplanner.accounts;

/** Stored accounts for tests, found or created by role, team and e-mail. */
public final class TestAccounts {

    /** The password of every test account. */
    public static final String PASSWORD = "correct horse battery staple";

    private final AccountService accounts;
    private final AccountRepository repository;

    public TestAccounts(AccountService accounts, AccountRepository repository) {
        this.accounts = accounts;
        this.repository = repository;
    }

    /** The account of that role in that team (blank: the default team), created when missing. */
    public synchronized Account account(Role role, String team, String email) {
        String mail = email == null || email.isBlank() ? SignedInContextFactory.defaultEmail(role, team) : email;
        return repository.findByEmail(mail).orElseGet(() -> {
            long teamId = team == null || team.isBlank() ? accounts.defaultTeam().id()
                    : repository.findTeamByName(team).map(Team::id).orElseGet(() -> accounts.createTeam(team).id());
            return accounts.create(mail, role.name().toLowerCase(java.util.Locale.ROOT) + " of " + (team == null
                    || team.isBlank() ? "the default team" : team), PASSWORD, role, teamId);
        });
    }

    /** The e-mail a {@link SignedIn} annotation signs in with. */
    public static String email(SignedIn annotation) {
        return annotation.email().isBlank() ? SignedInContextFactory.defaultEmail(annotation.role(), annotation.team())
                : annotation.email();
    }
}
