package org.nebulith.survey;

/**
 * A star whose survey failed: names the star, its catalogue line and the draw (the cause says why).
 */
public final class StarJobException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** Draw index used for the nominal estimate (at the catalogue values). */
    public static final int NOMINAL = -1;

    private final String star;
    private final long line;
    private final int draw;

    /**
     * @param star  the star
     * @param line  its catalogue line
     * @param draw  the failing draw, or {@link #NOMINAL}
     * @param cause why
     */
    public StarJobException(String star, long line, int draw, Throwable cause) {
        super("star '" + star + "' (catalogue line " + line + "), "
                + (draw == NOMINAL ? "nominal estimate" : "draw " + draw) + ": " + cause.getMessage(), cause);
        this.star = star;
        this.line = line;
        this.draw = draw;
    }

    /** @return the star */
    public String star() {
        return star;
    }

    /** @return its catalogue line */
    public long line() {
        return line;
    }

    /** @return the failing draw, or {@link #NOMINAL} */
    public int draw() {
        return draw;
    }
}
