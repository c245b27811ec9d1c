package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.mock.web.MockHttpSession;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.setup.MockMvcBuilders;
import org.springframework.web.context.WebApplicationContext;

/**
 * A fresh install: the first visit leads to the setup page, which creates the first administrator
 * and signs them in, once; afterwards it is closed. From another machine it also wants the setup code.
 */
@SpringBootTest(properties = "lpz.test.fresh-install=true")
@DirtiesContext
class SetupPageTest {

    @Autowired
    WebApplicationContext context;

    @Autowired
    AccountService accounts;

    @Test
    void firstVisitSetsUpTheAdministratorOnceAndSignsIn() throws Exception {
        MockMvc mvc = MockMvcBuilders.webAppContextSetup(context).apply(springSecurity()).build();
        assertThat(accounts.needsSetup()).isTrue();
        mvc.perform(get("/")).andExpect(redirectedUrl("/login"));
        mvc.perform(get("/login")).andExpect(redirectedUrl("/setup"));
        String form = mvc.perform(get("/setup")).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
        assertThat(form).contains("id=\"setup-form\"", "name=\"_csrf\"").doesNotContain("name=\"code\"");

        // from another machine the setup code is needed; nothing is created without it
        mvc.perform(post("/setup").with(csrf()).with(r -> {
            r.setRemoteAddr("203.0.113.10");
            return r;
        }).param("email", "intruder@example.org").param("password", "a long enough password")
                .param("passwordAgain", "a long enough password")).andExpect(status().isBadRequest());
        assertThat(accounts.needsSetup()).isTrue();

        MockHttpSession session = new MockHttpSession();
        mvc.perform(post("/setup").session(session).with(csrf()).param("email", "Chief@Example.org")
                .param("name", "Chief").param("password", "a long enough password")
                .param("passwordAgain", "a long enough password").param("team", "Riverside design office"))
                .andExpect(redirectedUrl("/"));
        Account admin = accounts.list().get(0);
        assertThat(admin.email()).isEqualTo("chief@example.org");
        assertThat(admin.role()).isEqualTo(Role.ADMIN);
        assertThat(accounts.team(admin.teamId()).name()).isEqualTo("Riverside design office");
        assertThat(accounts.defaultTeam().id()).isEqualTo(admin.teamId());
        // signed in at once: the admin page opens with the session of the setup
        mvc.perform(get("/admin").session(session)).andExpect(status().isOk());

        // the page is closed for good
        mvc.perform(get("/setup")).andExpect(redirectedUrl("/login"));
        mvc.perform(post("/setup").with(csrf()).param("email", "second@example.org")
                .param("password", "another long password").param("passwordAgain", "another long password"))
                .andExpect(status().isForbidden());
        assertThat(accounts.list()).hasSize(1);
        mvc.perform(get("/login")).andExpect(status().isOk());
    }
}
