package org.lpzplanner.accounts;

import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.ModelAndView;

/**
 * The administrator's page ({@code /admin}): every account with its role, team and whether it
 * may sign in, and the teams. Forms: {@code POST /admin/accounts} creates an account,
 * {@code POST /admin/accounts/{id}} changes role, team or access, {@code POST /admin/teams} adds a
 * team. Only administrators reach it (see {@link SecurityConfiguration}).
 */
@Controller
public class AdminPageController {

    private final AccountService accounts;

    public AdminPageController(AccountService accounts) {
        this.accounts = accounts;
    }

    @GetMapping("/admin")
    public ModelAndView page() {
        return page(HttpStatus.OK);
    }

    @PostMapping("/admin/accounts")
    public ModelAndView create(@RequestParam(required = false) String email,
            @RequestParam(required = false) String name, @RequestParam(required = false) String password,
            @RequestParam(required = false) String role, @RequestParam(required = false) Long team) {
        try {
            accounts.create(email, name, password, Role.parse(role), requireTeam(team));
            return new ModelAndView("redirect:/admin");
        } catch (InvalidInputException e) {
            ModelAndView page = page(HttpStatus.BAD_REQUEST);
            page.addObject("accountError", e.getMessage());
            page.addObject("enteredEmail", email);
            page.addObject("enteredName", name);
            return page;
        }
    }

    @PostMapping("/admin/accounts/{id}")
    public ModelAndView update(@PathVariable long id, @RequestParam(required = false) String role,
            @RequestParam(required = false) Long team, @RequestParam(required = false) String enabled) {
        try {
            accounts.update(id, Role.parse(role), requireTeam(team), "yes".equals(enabled));
            return new ModelAndView("redirect:/admin");
        } catch (InvalidInputException e) {
            ModelAndView page = page(HttpStatus.BAD_REQUEST);
            page.addObject("updateError", e.getMessage());
            return page;
        }
    }

    @PostMapping("/admin/teams")
    public ModelAndView createTeam(@RequestParam(required = false) String name) {
        try {
            accounts.createTeam(name);
            return new ModelAndView("redirect:/admin");
        } catch (InvalidInputException e) {
            ModelAndView page = page(HttpStatus.BAD_REQUEST);
            page.addObject("teamError", e.getMessage());
            return page;
        }
    }

    private static long requireTeam(Long team) {
        if (team == null) {
            throw new InvalidInputException("team", "choose a team");
        }
        return team;
    }

    private ModelAndView page(HttpStatus status) {
        ModelAndView page = new ModelAndView("accounts/admin", status);
        page.addObject("accounts", accounts.list());
        page.addObject("teams", accounts.teams());
        Map<Long, String> teamNames = accounts.teams().stream()
                .collect(Collectors.toMap(Team::id, Team::name));
        page.addObject("teamNames", teamNames);
        page.addObject("roles", Role.values());
        page.addObject("minPassword", AccountService.MIN_PASSWORD);
        return page;
    }
}
