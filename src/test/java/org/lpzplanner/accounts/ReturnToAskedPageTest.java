package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.mock.web.MockHttpServletRequest;
import org.springframework.security.web.savedrequest.DefaultSavedRequest;

/** Where signing in leads: the path and query of the page asked for, never another server. */
class ReturnToAskedPageTest {

    private static DefaultSavedRequest asked(String method, String host, String path, String query) {
        MockHttpServletRequest request = new MockHttpServletRequest(method, path);
        request.setServerName(host);
        request.setQueryString(query);
        return new DefaultSavedRequest(request, "continue");
    }

    @Test
    void thePageAskedForByItsPathAndQueryWithoutTheHost() {
        assertThat(ReturnToAskedPage.target(asked("GET", "evil.example", "/sites/7", null))).isEqualTo("/sites/7");
        assertThat(ReturnToAskedPage.target(asked("GET", "evil.example", "/sites/7/section", "x=1&continued=2")))
                .isEqualTo("/sites/7/section?x=1&continued=2");
    }

    @Test
    void theSiteListWithoutAPageAskedForOrAfterAFormOrAStrangePath() {
        assertThat(ReturnToAskedPage.target(null)).isEqualTo("/");
        assertThat(ReturnToAskedPage.target(asked("POST", "localhost", "/sites/7/comments", null))).isEqualTo("/");
        assertThat(ReturnToAskedPage.target(asked("GET", "localhost", "//evil.example/x", null))).isEqualTo("/");
    }
}
