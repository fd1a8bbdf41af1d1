package org.nebulith.survey;

import java.io.Serializable;
import java.util.Optional;

import org.nebulith.errors.Messages;
import org.nebulith.errors.NebulithException;

/**
 * One failed estimate of a survey, as a row of {@code failures.csv}: which star, which draw, where
 * it failed (zone, and the disk's T and P there, when the failure names them), and why.
 *
 * @param star   the star
 * @param draw   the draw index (0-based), or {@link StarJobException#NOMINAL} for the nominal estimate
 * @param zone   the feeding zone, empty when the failure names none
 * @param tK     temperature of the failing state [K], or NaN when the failure names none (an empty cell)
 * @param pBar   pressure of the failing state [bar], or NaN when unnamed (an empty cell)
 * @param reason why, one line
 */
public record DrawFailure(String star, int draw, String zone, double tK, double pBar, String reason)
        implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Stage of a nominal failure (the star's catalogue values). */
    public static final String NOMINAL = "nominal";
    /** Stage of a failed Monte Carlo draw. */
    public static final String DRAW = "draw";

    /** @return {@link #NOMINAL} or {@link #DRAW} */
    public String stage() {
        return draw == StarJobException.NOMINAL ? NOMINAL : DRAW;
    }

    /**
     * @param star  the star
     * @param draw  the draw, or {@link StarJobException#NOMINAL}
     * @param cause what the estimate threw
     * @return the failure, with the zone, T and P named in the cause chain if any
     */
    public static DrawFailure of(String star, int draw, Throwable cause) {
        Optional<NebulithException> located = located(cause);
        if (located.isPresent()) {
            Object[] p = located.get().parts();
            if (located.get().key() == Messages.ZONE_STATE_FAILURE) {
                return new DrawFailure(star, draw, String.valueOf(p[0]), number(p[2]), number(p[3]), oneLine(p[4]));
            }
            int t = located.get().key() == Messages.NO_CONVERGENCE ? 0 : 1;
            return new DrawFailure(star, draw, "", number(p[t]), number(p[t + 1]), oneLine(located.get().getMessage()));
        }
        String m = cause.getMessage();
        return new DrawFailure(star, draw, "", Double.NaN, Double.NaN,
                oneLine(m == null || m.isBlank() ? cause.getClass().getSimpleName() : m));
    }

    /** The first failure in the chain that names a state: a zone, or the solver's T and P. */
    private static Optional<NebulithException> located(Throwable cause) {
        for (Throwable t = cause; t != null; t = t.getCause()) {
            if (t instanceof NebulithException n && (n.key() == Messages.ZONE_STATE_FAILURE
                    || n.key() == Messages.NO_CONVERGENCE || n.key() == Messages.NUMERICAL_FAILURE)) {
                return Optional.of(n);
            }
        }
        return Optional.empty();
    }

    private static double number(Object o) {
        return o instanceof Number n ? n.doubleValue() : Double.NaN;
    }

    private static String oneLine(Object text) {
        return String.valueOf(text).replaceAll("\\s*[\\r\\n]+\\s*", " ").strip();
    }
}
