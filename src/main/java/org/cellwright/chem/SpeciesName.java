package org.cellwright.chem;

import java.util.ArrayList;
import java.util.List;

/**
 * Trade notation of dissolved species, and its common variants.
 *
 * <p>The canonical form is the formula followed by the charge magnitude (omitted for 1) and the sign:
 * {@code Cu2+}, {@code H+}, {@code Cl-}, {@code NO3-}. Where the formula itself ends in a digit a caret
 * separates the charge: {@code SO4^2-}. Accepted variants: {@code Cu++}, {@code Cu^2+}, {@code Cu 2+},
 * {@code SO4--}, {@code SO4 2-}, {@code SO42-}. Neutral species are written as their formula ("Cl2").
 */
public final class SpeciesName {

    private SpeciesName() {
    }

    /**
     * Formats a formula and a charge in the canonical notation.
     *
     * @param formula the formula without charge ("SO4")
     * @param charge the signed charge number
     * @return the canonical name ("SO4^2-")
     */
    public static String format(String formula, int charge) {
        if (charge == 0) {
            return formula;
        }
        StringBuilder sb = new StringBuilder(formula);
        int magnitude = Math.abs(charge);
        if (magnitude > 1) {
            if (Character.isDigit(formula.charAt(formula.length() - 1))) {
                sb.append('^');
            }
            sb.append(magnitude);
        }
        sb.append(charge > 0 ? '+' : '-');
        return sb.toString();
    }

    /**
     * Reads a species name written in any accepted variant and returns the canonical names it may mean,
     * the most likely first. {@code NO3-} may mean the nitrate ion (formula NO3, charge -1) or a formula NO
     * with charge -3; a library look-up picks the one that exists.
     *
     * @param raw the name as written by a person
     * @return candidate canonical names, never empty for non-blank input
     */
    public static List<String> candidates(String raw) {
        String s = raw == null ? "" : raw.strip();
        List<String> out = new ArrayList<>();
        if (s.isEmpty()) {
            return out;
        }
        char last = s.charAt(s.length() - 1);
        if (last != '+' && last != '-') {
            out.add(s.replace(" ", ""));
            return out;
        }
        int sign = last == '+' ? 1 : -1;
        int end = s.length();
        int signs = 0;
        while (end > 0 && s.charAt(end - 1) == last) {
            end--;
            signs++;
        }
        String body = s.substring(0, end);
        if (signs > 1) {
            addFormatted(out, clean(body), sign * signs);
            return out;
        }
        int sep = Math.max(body.lastIndexOf('^'), body.lastIndexOf(' '));
        if (sep > 0) {
            String formula = clean(body.substring(0, sep));
            String digits = body.substring(sep + 1).strip();
            if (digits.isEmpty()) {
                addFormatted(out, formula, sign);
            } else if (digits.chars().allMatch(Character::isDigit)) {
                addFormatted(out, formula, sign * Integer.parseInt(digits));
            }
            return out;
        }
        int d = body.length();
        while (d > 0 && Character.isDigit(body.charAt(d - 1))) {
            d--;
        }
        if (d < body.length() && d > 0 && body.length() - d == 1) {
            addFormatted(out, body.substring(0, d), sign * Integer.parseInt(body.substring(d)));
        } else if (d > 0 && body.length() - d > 1) {
            // "SO42-": the last digit is the charge, the ones before it belong to the formula
            int chargeDigit = body.length() - 1;
            addFormatted(out, body.substring(0, chargeDigit), sign * Integer.parseInt(body.substring(chargeDigit)));
        }
        addFormatted(out, body, sign);
        return out;
    }

    private static String clean(String formula) {
        return formula.replace(" ", "").replace("^", "");
    }

    private static void addFormatted(List<String> out, String formula, int charge) {
        if (formula.isEmpty() || !Character.isLetter(formula.charAt(0))) {
            return;
        }
        String name = format(formula, charge);
        if (!out.contains(name)) {
            out.add(name);
        }
    }
}
