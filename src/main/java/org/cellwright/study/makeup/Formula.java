package org.cellwright.study.makeup;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Reads a chemical formula as the trade writes it into atoms per formula unit: element symbols with counts,
 * parentheses ({@code Pb(NO3)2}) and water of crystallisation after a dot ({@code CuSO4·5H2O},
 * {@code CuSO4.5H2O}, {@code CuSO4*5H2O}).
 */
public final class Formula {

    private final String text;
    private int pos;

    private Formula(String text) {
        this.text = text;
    }

    /**
     * @param formula the formula
     * @return element symbol to atoms, in order of first appearance
     * @throws IllegalArgumentException when it is not a formula
     */
    public static Map<String, Integer> elements(String formula) {
        String s = formula.strip().replace('·', '.').replace('*', '.').replace("•", ".");
        Map<String, Integer> out = new LinkedHashMap<>();
        for (String part : s.split("\\.")) {
            if (part.isEmpty()) {
                throw new IllegalArgumentException("'" + formula + "' is not a formula");
            }
            int i = 0;
            while (i < part.length() && Character.isDigit(part.charAt(i))) {
                i++;
            }
            int times = i == 0 ? 1 : Integer.parseInt(part.substring(0, i));
            Formula f = new Formula(part.substring(i));
            Map<String, Integer> group = f.group();
            if (f.pos != f.text.length() || group.isEmpty()) {
                throw new IllegalArgumentException("'" + formula + "' is not a formula");
            }
            group.forEach((el, n) -> out.merge(el, n * times, Integer::sum));
        }
        return out;
    }

    private Map<String, Integer> group() {
        Map<String, Integer> out = new LinkedHashMap<>();
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (c == '(') {
                pos++;
                Map<String, Integer> inner = group();
                if (pos >= text.length() || text.charAt(pos) != ')') {
                    throw new IllegalArgumentException("unbalanced '(' in '" + text + "'");
                }
                pos++;
                int n = count();
                inner.forEach((el, k) -> out.merge(el, k * n, Integer::sum));
            } else if (c == ')') {
                return out;
            } else if (Character.isUpperCase(c)) {
                int start = pos++;
                while (pos < text.length() && Character.isLowerCase(text.charAt(pos))) {
                    pos++;
                }
                String el = text.substring(start, pos);
                out.merge(el, count(), Integer::sum);
            } else {
                throw new IllegalArgumentException("unexpected '" + c + "' in '" + text + "'");
            }
        }
        return out;
    }

    private int count() {
        int start = pos;
        while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
            pos++;
        }
        return start == pos ? 1 : Integer.parseInt(text.substring(start, pos));
    }
}
