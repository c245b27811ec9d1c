package org.lpzplanner.accounts;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;

/**
 * The sign-in page ({@code /login}); before the first account exists it sends visitors to the setup
 * page. After a refused sign-in of a locked account it says how many minutes are left
 * ({@code /login?throttled=N}).
 */
@Controller
public class SignInPageController {

    private final AccountService accounts;

    public SignInPageController(AccountService accounts) {
        this.accounts = accounts;
    }

    @GetMapping("/login")
    public ModelAndView signIn(@RequestParam(required = false) String throttled) {
        if (accounts.needsSetup()) {
            return new ModelAndView("redirect:/setup");
        }
        ModelAndView page = new ModelAndView("accounts/login");
        if (throttled != null && throttled.matches("[1-9][0-9]{0,4}")) {
            page.addObject("waitMinutes", Integer.parseInt(throttled));
        }
        return page;
    }
}
