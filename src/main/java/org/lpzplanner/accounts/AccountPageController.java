package org.lpzplanner.accounts;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpStatus;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.web.authentication.logout.SecurityContextLogoutHandler;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;

/**
 * The signed-in person's own page ({@code /account}): role and team, password change
 * ({@code POST /account/password}) and personal API tokens ({@code POST /account/tokens} creates
 * one and shows it once; {@code POST /account/tokens/{id}/revoke} revokes it).
 */
@Controller
public class AccountPageController {

    private final AccountService accounts;
    private final ApiTokenService tokens;

    public AccountPageController(AccountService accounts, ApiTokenService tokens) {
        this.accounts = accounts;
        this.tokens = tokens;
    }

    @GetMapping("/account")
    public ModelAndView page() {
        return page(HttpStatus.OK);
    }

    @PostMapping("/account/tokens")
    public ModelAndView createToken(@RequestParam(required = false) String label) {
        try {
            String token = tokens.create(me().accountId(), label);
            ModelAndView page = page(HttpStatus.OK);
            page.addObject("newToken", token);
            return page;
        } catch (InvalidInputException e) {
            ModelAndView page = page(HttpStatus.BAD_REQUEST);
            page.addObject("tokenError", e.getMessage());
            return page;
        }
    }

    @PostMapping("/account/tokens/{id}/revoke")
    public ModelAndView revoke(@PathVariable long id) {
        tokens.revoke(me().accountId(), id);
        return new ModelAndView("redirect:/account");
    }

    /** A changed password ends every session of the account, this one too: the person signs in again. */
    @PostMapping("/account/password")
    public ModelAndView password(@RequestParam(required = false) String current,
            @RequestParam(required = false) String password, @RequestParam(required = false) String passwordAgain,
            HttpServletRequest request, HttpServletResponse response) {
        try {
            if (password == null || !password.equals(passwordAgain)) {
                throw new InvalidInputException("passwordAgain", "the two new passwords differ");
            }
            accounts.changePassword(me().accountId(), current, password);
            new SecurityContextLogoutHandler().logout(request, response,
                    SecurityContextHolder.getContext().getAuthentication());
            return new ModelAndView("redirect:/login?passwordChanged");
        } catch (InvalidInputException e) {
            ModelAndView page = page(HttpStatus.BAD_REQUEST);
            page.addObject("passwordError", e.getMessage());
            return page;
        }
    }

    private static final java.time.format.DateTimeFormatter WHEN = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm 'UTC'", java.util.Locale.ROOT).withZone(java.time.ZoneOffset.UTC);

    /** A token as the page lists it, times already written. */
    record TokenRow(long id, String label, String createdAt, String lastUsedAt) {
    }

    private static SignedInAccount me() {
        return CurrentAccount.signedIn().orElseThrow();
    }

    private ModelAndView page(HttpStatus status) {
        SignedInAccount me = me();
        ModelAndView page = new ModelAndView("accounts/account", status);
        page.addObject("account", me);
        page.addObject("team", accounts.team(me.teamId()).name());
        page.addObject("tokens", tokens.list(me.accountId()).stream().map(t -> new TokenRow(t.id(), t.label(),
                WHEN.format(t.createdAt()), t.lastUsedAt() == null ? null : WHEN.format(t.lastUsedAt()))).toList());
        page.addObject("minPassword", AccountService.MIN_PASSWORD);
        return page;
    }
}
