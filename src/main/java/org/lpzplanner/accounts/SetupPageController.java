package org.lpzplanner.accounts;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpStatus;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.web.context.HttpSessionSecurityContextRepository;
import org.springframework.security.web.context.SecurityContextRepository;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;

/**
 * The one-time setup page ({@code /setup}): while no account exists it creates the first
 * administrator and signs them in; afterwards it only points to the sign-in page, and a posted
 * form is refused with 403.
 */
@Controller
public class SetupPageController {

    private final AccountService accounts;
    private final SetupCode setupCode;
    private final SecurityContextRepository contexts = new HttpSessionSecurityContextRepository();

    public SetupPageController(AccountService accounts, SetupCode setupCode) {
        this.accounts = accounts;
        this.setupCode = setupCode;
    }

    @GetMapping("/setup")
    public ModelAndView form(HttpServletRequest request) {
        if (!accounts.needsSetup()) {
            return new ModelAndView("redirect:/login");
        }
        return page(request, HttpStatus.OK);
    }

    @PostMapping("/setup")
    public ModelAndView create(@RequestParam(required = false) String email,
            @RequestParam(required = false) String name, @RequestParam(required = false) String password,
            @RequestParam(required = false) String passwordAgain, @RequestParam(required = false) String team,
            @RequestParam(required = false) String code, HttpServletRequest request, HttpServletResponse response) {
        if (!accounts.needsSetup()) {
            ModelAndView done = new ModelAndView("accounts/login", HttpStatus.FORBIDDEN);
            done.addObject("setupDone", true);
            return done;
        }
        try {
            if (!setupCode.permits(request.getRemoteAddr(), code)) {
                throw new InvalidInputException("code", "the setup code is not right; the app prints it to its"
                        + " log at start");
            }
            if (password == null || !password.equals(passwordAgain)) {
                throw new InvalidInputException("passwordAgain", "the two passwords differ");
            }
            Account admin = accounts.createFirstAdmin(email, name, password, team);
            signIn(admin, request, response);
            return new ModelAndView("redirect:/");
        } catch (InvalidInputException e) {
            ModelAndView page = page(request, HttpStatus.BAD_REQUEST);
            page.addObject("setupError", e.getMessage());
            page.addObject("enteredEmail", email);
            page.addObject("enteredName", name);
            page.addObject("enteredTeam", team);
            return page;
        } catch (SetupDoneException e) {
            ModelAndView done = new ModelAndView("accounts/login", HttpStatus.FORBIDDEN);
            done.addObject("setupDone", true);
            return done;
        }
    }

    private ModelAndView page(HttpServletRequest request, HttpStatus status) {
        ModelAndView page = new ModelAndView("accounts/setup", status);
        page.addObject("needsCode", !SetupCode.isLoopback(request.getRemoteAddr()));
        page.addObject("defaultTeam", accounts.defaultTeam().name());
        page.addObject("minPassword", AccountService.MIN_PASSWORD);
        return page;
    }

    private void signIn(Account admin, HttpServletRequest request, HttpServletResponse response) {
        SignedInAccount principal = new SignedInAccount(admin);
        principal.eraseCredentials();
        SecurityContext context = SecurityContextHolder.createEmptyContext();
        context.setAuthentication(UsernamePasswordAuthenticationToken.authenticated(principal, null,
                principal.getAuthorities()));
        SecurityContextHolder.setContext(context);
        request.getSession(true);
        request.changeSessionId();
        contexts.saveContext(context, request, response);
    }
}
