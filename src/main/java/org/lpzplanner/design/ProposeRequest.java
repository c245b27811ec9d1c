package org.lpzplanner.design;

import java.util.List;

/**
 * What a designer asks a proposal for: allowed rod heights, mast heights (may be empty), whether
 * roof-edge and ridge conductors may be proposed, keep-out polygons in local metres. The site's
 * stored keep-out areas always apply as well; these add to them for this proposal only.
 */
public record ProposeRequest(List<Double> rodHeights, List<Double> mastHeights, boolean edgeConductors,
        boolean ridgeConductors, List<List<double[]>> keepOut) {

    public ProposeRequest(List<Double> rodHeights, List<Double> mastHeights, List<List<double[]>> keepOut) {
        this(rodHeights, mastHeights, false, false, keepOut);
    }
}
