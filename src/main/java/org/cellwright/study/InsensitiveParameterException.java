package org.cellwright.study;

import java.util.List;

/**
 * A free parameter that does not change any measured value at its starting point: the data cannot say
 * anything about it (for example an exchange current density of a reaction that does not run on the
 * electrode's material, or a parameter that only acts after the log ends).
 */
public final class InsensitiveParameterException extends IllegalArgumentException {

    private final List<String> keys;

    /** @param keys the parameters that move nothing */
    public InsensitiveParameterException(List<String> keys) {
        super((keys.size() == 1 ? keys.get(0) + " does" : String.join(", ", keys) + " do")
                + " not change any of the measured values; the data cannot determine "
                + (keys.size() == 1 ? "it" : "them"));
        this.keys = List.copyOf(keys);
    }

    /** @return the keys of the parameters that move nothing */
    public List<String> keys() {
        return keys;
    }
}
