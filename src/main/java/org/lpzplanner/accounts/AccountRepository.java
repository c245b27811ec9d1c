package org.lpzplanner.accounts;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;

/** Reads and writes the {@code accounts} and {@code teams} tables. E-mails are stored lower-case. */
@Repository
public class AccountRepository {

    private static final String COLUMNS = "id, email, display_name, password_hash, role, team_id, enabled, created_at";

    private final JdbcClient jdbc;

    public AccountRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    public long countAccounts() {
        return jdbc.sql("SELECT COUNT(*) FROM accounts").query(Long.class).single();
    }

    public Optional<Account> findByEmail(String email) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM accounts WHERE email = ?").param(email)
                .query(AccountRepository::row).optional();
    }

    public Optional<Account> findById(long id) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM accounts WHERE id = ?").param(id)
                .query(AccountRepository::row).optional();
    }

    public List<Account> findAll() {
        return jdbc.sql("SELECT " + COLUMNS + " FROM accounts ORDER BY email").query(AccountRepository::row).list();
    }

    public Account insert(String email, String displayName, String passwordHash, Role role, long teamId, Instant now) {
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO accounts (email, display_name, password_hash, role, team_id, enabled, created_at)"
                        + " VALUES (?, ?, ?, ?, ?, TRUE, ?)")
                .params(email, displayName, passwordHash, role.name(), teamId, Timestamp.from(now))
                .update(keys, "id");
        return new Account(keys.getKeyAs(Number.class).longValue(), email, displayName, passwordHash, role, teamId,
                true, now);
    }

    public void update(long id, Role role, long teamId, boolean enabled) {
        jdbc.sql("UPDATE accounts SET role = ?, team_id = ?, enabled = ? WHERE id = ?")
                .params(role.name(), teamId, enabled, id).update();
    }

    public void updatePassword(long id, String passwordHash) {
        jdbc.sql("UPDATE accounts SET password_hash = ? WHERE id = ?").params(passwordHash, id).update();
    }

    /** Ends every stored session of the account (Spring Session JDBC indexes them by principal name). */
    public void endSessions(String email) {
        jdbc.sql("DELETE FROM SPRING_SESSION WHERE PRINCIPAL_NAME = ?").param(email).update();
    }

    public long countEnabledAdmins() {
        return jdbc.sql("SELECT COUNT(*) FROM accounts WHERE role = 'ADMIN' AND enabled = TRUE")
                .query(Long.class).single();
    }

    public List<Team> findTeams() {
        return jdbc.sql("SELECT id, name, created_at FROM teams ORDER BY id").query(AccountRepository::teamRow).list();
    }

    public Optional<Team> findTeam(long id) {
        return jdbc.sql("SELECT id, name, created_at FROM teams WHERE id = ?").param(id)
                .query(AccountRepository::teamRow).optional();
    }

    public Optional<Team> findTeamByName(String name) {
        return jdbc.sql("SELECT id, name, created_at FROM teams WHERE name_key = ?").param(nameKey(name))
                .query(AccountRepository::teamRow).optional();
    }

    /** The team created by the schema, which owns sites stored before accounts existed and the demo sites. */
    public Team defaultTeam() {
        return jdbc.sql("SELECT id, name, created_at FROM teams ORDER BY id FETCH FIRST 1 ROWS ONLY")
                .query(AccountRepository::teamRow).single();
    }

    public Team insertTeam(String name, Instant now) {
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO teams (name, name_key, created_at) VALUES (?, ?, ?)")
                .params(name, nameKey(name), Timestamp.from(now))
                .update(keys, "id");
        return new Team(keys.getKeyAs(Number.class).longValue(), name, now);
    }

    /** Locks a team row until the transaction ends (serialises the first-run setup across instances). */
    public void lockTeam(long id) {
        jdbc.sql("SELECT id FROM teams WHERE id = ? FOR UPDATE").param(id).query(Long.class).single();
    }

    public void renameTeam(long id, String name) {
        jdbc.sql("UPDATE teams SET name = ?, name_key = ? WHERE id = ?").params(name, nameKey(name), id).update();
    }

    /** Team names are unique whatever their letter case; the key carries the constraint. */
    static String nameKey(String name) {
        return name.toLowerCase(java.util.Locale.ROOT);
    }

    private static Account row(ResultSet rs, int rowNum) throws SQLException {
        return new Account(rs.getLong("id"), rs.getString("email"), rs.getString("display_name"),
                rs.getString("password_hash"), Role.valueOf(rs.getString("role")), rs.getLong("team_id"),
                rs.getBoolean("enabled"), rs.getTimestamp("created_at").toInstant());
    }

    private static Team teamRow(ResultSet rs, int rowNum) throws SQLException {
        return new Team(rs.getLong("id"), rs.getString("name"), rs.getTimestamp("created_at").toInstant());
    }
}
