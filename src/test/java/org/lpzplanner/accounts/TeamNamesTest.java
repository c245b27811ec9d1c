package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;

/**
 * Team names are told apart by people reading a list, so two names that differ only in letter
 * case (Unicode simple case folding, as {@link String#toLowerCase} with the root locale) are the
 * same team name; the database holds the rule too, so parallel requests cannot slip past it.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
class TeamNamesTest {

    @Autowired
    AccountService accounts;

    @Autowired
    AccountRepository repository;

    @Test
    void aNameDifferingOnlyByCaseIsRefused() {
        Team first = accounts.createTeam("Harbour Lane Office");
        assertThatThrownBy(() -> accounts.createTeam("harbour lane OFFICE"))
                .isInstanceOf(InvalidInputException.class).hasMessageContaining("exists already");
        assertThatThrownBy(() -> accounts.createTeam("  HARBOUR LANE OFFICE "))
                .isInstanceOf(InvalidInputException.class);
        assertThat(repository.findTeamByName("HARBOUR lane office")).map(Team::id).contains(first.id());
        assertThat(accounts.createTeam("Harbour Lane Office 2").id()).isNotEqualTo(first.id());
    }

    @Test
    void theDatabaseRefusesTheSameNameInAnotherCase() {
        repository.insertTeam("Quarry Road Depot", java.time.Instant.now());
        assertThatThrownBy(() -> repository.insertTeam("QUARRY ROAD DEPOT", java.time.Instant.now()))
                .isInstanceOf(org.springframework.dao.DuplicateKeyException.class);
    }
}
