package org.lpzplanner.design;

/** Design figures as the design page and its API write them: metres to the centimetre. */
final class Centimetres {

    private Centimetres() {
    }

    static double round(double metres) {
        return Math.round(metres * 100) / 100.0;
    }
}
