package org.nebulith.planet.interior;

/** The structure equations could not be solved for a model (the message names the model). */
public final class StructureException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param model the model
     * @param what  what went wrong
     * @param cause the cause, or null
     */
    public StructureException(final InteriorModel model, final String what, final Throwable cause) {
        super(what + " (mass " + model.massMearth() + " M_earth, core mass fraction " + model.coreMassFraction()
                + ", water mass fraction " + model.waterMassFraction() + ", mantle Mg# " + model.mantle().mgNumber()
                + ", (Mg+Fe)/Si " + model.mantle().cationsPerSi() + ", core Si " + model.core().siWtPct() + " wt%, O "
                + model.core().oWtPct() + " wt%)", cause);
    }
}
