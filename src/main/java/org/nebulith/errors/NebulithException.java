package org.nebulith.errors;

import java.util.Arrays;

/**
 * Base of Nebulith's few unchecked exceptions. The message comes from {@link Messages}; the key
 * and the parts are kept so that callers (and tests) can inspect what went wrong without parsing
 * text.
 */
public abstract class NebulithException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final Messages key;
    private final transient Object[] parts;

    /**
     * @param key   the message template
     * @param cause the underlying cause, or null
     * @param parts the template parameters
     */
    protected NebulithException(final Messages key, final Throwable cause, final Object... parts) {
        super(key.format(parts), cause);
        this.key = key;
        this.parts = parts.clone();
    }

    /** @return the message template that produced this exception */
    public Messages key() {
        return key;
    }

    /** @return a copy of the template parameters */
    public Object[] parts() {
        return Arrays.copyOf(parts, parts.length);
    }
}
