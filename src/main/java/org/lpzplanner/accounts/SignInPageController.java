package org.lpzplanner.accounts;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The sign-in page ({@code /login}); before the first account exists it sends visitors to the setup page. */
@Controller
public class SignInPageController {

    private final AccountService accounts;

    public SignInPageController(AccountService accounts) {
        this.accounts = accounts;
    }

    @GetMapping("/login")
    public String signIn() {
        return accounts.needsSetup() ? "redirect:/setup" : "accounts/login";
    }
}
