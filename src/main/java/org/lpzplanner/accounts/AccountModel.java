package org.lpzplanner.accounts;

import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ModelAttribute;

/**
 * Gives every page who is signed in ({@code me}, null on the sign-in and setup pages) and whether
 * they may edit sites ({@code canEdit}), so templates show only the forms the role can use.
 */
@ControllerAdvice
public class AccountModel {

    @ModelAttribute("me")
    SignedInAccount me() {
        return CurrentAccount.signedIn().orElse(null);
    }

    @ModelAttribute("canEdit")
    boolean canEdit() {
        return CurrentAccount.signedIn().map(a -> a.role().edits()).orElse(false);
    }

    @ModelAttribute("isAdmin")
    boolean isAdmin() {
        return CurrentAccount.signedIn().map(a -> a.role() == Role.ADMIN).orElse(false);
    }
}
