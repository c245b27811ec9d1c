package org.lpzplanner.transfer;

import java.io.IOException;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.ModelAndView;

/** The import form of the site list: a good export opens as a new site, a bad one says why. */
@Controller
public class SiteTransferPageController {

    private final SiteTransferService transfers;

    public SiteTransferPageController(SiteTransferService transfers) {
        this.transfers = transfers;
    }

    @PostMapping("/sites/import")
    public ModelAndView importSite(@RequestParam(value = "file", required = false) MultipartFile file)
            throws IOException {
        try {
            long id = transfers.importSite(file == null ? new byte[0] : file.getBytes());
            return new ModelAndView("redirect:/sites/" + id);
        } catch (InvalidInputException | SiteFormatException e) {
            ModelAndView page = new ModelAndView("sites/import-failed", HttpStatus.BAD_REQUEST);
            page.addObject("reason", e.getMessage());
            return page;
        }
    }
}
