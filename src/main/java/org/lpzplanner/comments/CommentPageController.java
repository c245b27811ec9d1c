package org.lpzplanner.comments;

import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.SitePages;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * Plan-page forms open to every role of the site's team: {@code POST /sites/{id}/comments}
 * ({@code comment}) and {@code POST /sites/{id}/reviewed} (marks the latest revision reviewed).
 */
@Controller
@SitePages
public class CommentPageController {

    private final CommentService comments;

    public CommentPageController(CommentService comments) {
        this.comments = comments;
    }

    @PostMapping("/sites/{id}/comments")
    public String comment(@PathVariable long id, @RequestParam(required = false) String comment,
            RedirectAttributes flash) {
        try {
            comments.comment(id, comment);
        } catch (InvalidInputException e) {
            flash.addFlashAttribute("commentError", e.getMessage());
        }
        return "redirect:/sites/" + id + "#comments";
    }

    @PostMapping("/sites/{id}/reviewed")
    public String reviewed(@PathVariable long id) {
        comments.markReviewed(id);
        return "redirect:/sites/" + id + "#comments";
    }
}
