package org.tensio.engine.verification;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The arithmetic of the verification fixtures: numbers ({@code 2.313e4}), names bound by {@code let} lines,
 * {@code pi}, the operators {@code + - * / ^} ({@code ^} binds tightest and groups to the right, so
 * {@code -r^2} is −(r²)), parentheses and the functions listed in {@link #call}. Evaluated to a double at
 * once; no state.
 * <p>
 * Two reference functions carry series solutions that have no closed form (S. P. Timoshenko, J. N. Goodier,
 * <i>Theory of Elasticity</i>, 3rd ed., §109 "Torsion of rectangular bars" — from memory), summed over odd n
 * until a term falls below 1e-17 of the sum:
 * <ul>
 * <li>{@code rectJ(w, t)}: J = (w t³/3)·(1 − (192 t / (π⁵ w)) Σ tanh(nπw/(2t))/n⁵), w ≥ t;</li>
 * <li>{@code rectTau(w, t)}: τmax per unit torque, at the middle of the long sides,
 * t·(1 − (8/π²) Σ 1/(n² cosh(nπw/(2t)))) / J.</li>
 * </ul>
 */
final class Expr {

    private final String text;
    private final Map<String, Double> vars;
    private int pos;

    private Expr(String text, Map<String, Double> vars) {
        this.text = text;
        this.vars = vars;
    }

    /**
     * @param text an expression
     * @param vars the names it may use
     * @return its value
     * @throws IllegalArgumentException naming the expression and what is wrong (unknown name, syntax, a value
     *                                  that is not finite)
     */
    static double eval(String text, Map<String, Double> vars) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("empty expression");
        }
        Expr e = new Expr(text, vars);
        double v = e.sum();
        e.skipBlanks();
        if (e.pos != text.length()) {
            throw e.error("unexpected '" + text.charAt(e.pos) + "'");
        }
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("expression '" + text + "' is not finite (" + v + ")");
        }
        return v;
    }

    /**
     * Splits at the separators that are not inside parentheses ({@code "hypot(a,b),2"} → {@code "hypot(a,b)", "2"}).
     */
    static List<String> splitTopLevel(String s, char separator) {
        List<String> out = new ArrayList<>();
        int depth = 0, start = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '(') {
                depth++;
            } else if (c == ')') {
                depth--;
            } else if (c == separator && depth == 0) {
                out.add(s.substring(start, i).strip());
                start = i + 1;
            }
        }
        out.add(s.substring(start).strip());
        return out;
    }

    private double sum() {
        double v = product();
        for (;;) {
            skipBlanks();
            if (eat('+')) {
                v += product();
            } else if (eat('-')) {
                v -= product();
            } else {
                return v;
            }
        }
    }

    private double product() {
        double v = unary();
        for (;;) {
            skipBlanks();
            if (eat('*')) {
                v *= unary();
            } else if (eat('/')) {
                v /= unary();
            } else {
                return v;
            }
        }
    }

    private double unary() {
        skipBlanks();
        if (eat('-')) {
            return -unary();
        }
        if (eat('+')) {
            return unary();
        }
        return power();
    }

    private double power() {
        double base = primary();
        skipBlanks();
        if (eat('^')) {
            return Math.pow(base, unary());
        }
        return base;
    }

    private double primary() {
        skipBlanks();
        if (pos >= text.length()) {
            throw error("ends early");
        }
        char c = text.charAt(pos);
        if (eat('(')) {
            double v = sum();
            skipBlanks();
            if (!eat(')')) {
                throw error("')' expected");
            }
            return v;
        }
        if (Character.isDigit(c) || c == '.') {
            return number();
        }
        if (Character.isLetter(c) || c == '_') {
            int start = pos;
            while (pos < text.length() && (Character.isLetterOrDigit(text.charAt(pos)) || text.charAt(pos) == '_')) {
                pos++;
            }
            String name = text.substring(start, pos);
            skipBlanks();
            if (eat('(')) {
                List<Double> args = new ArrayList<>();
                skipBlanks();
                if (!eat(')')) {
                    do {
                        args.add(sum());
                        skipBlanks();
                    } while (eat(','));
                    if (!eat(')')) {
                        throw error("')' expected after the arguments of " + name);
                    }
                }
                return call(name, args);
            }
            if (name.equals("pi")) {
                return Math.PI;
            }
            Double v = vars.get(name);
            if (v == null) {
                throw error("unknown name '" + name + "'");
            }
            return v;
        }
        throw error("unexpected '" + c + "'");
    }

    private double number() {
        int start = pos;
        while (pos < text.length() && (Character.isDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
            pos++;
        }
        if (pos < text.length() && (text.charAt(pos) == 'e' || text.charAt(pos) == 'E')) {
            int save = pos;
            pos++;
            if (pos < text.length() && (text.charAt(pos) == '+' || text.charAt(pos) == '-')) {
                pos++;
            }
            if (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                    pos++;
                }
            } else {
                pos = save;
            }
        }
        try {
            return Double.parseDouble(text.substring(start, pos));
        } catch (NumberFormatException e) {
            throw error("bad number '" + text.substring(start, pos) + "'");
        }
    }

    /**
     * The functions: {@code sqrt cbrt abs exp ln sin cos tan atan sinh cosh tanh deg rad} (one argument),
     * {@code atan2 hypot pow min max rectJ rectTau} (two arguments).
     */
    private double call(String name, List<Double> a) {
        switch (name) {
            case "sqrt", "cbrt", "abs", "exp", "ln", "sin", "cos", "tan", "atan", "sinh", "cosh", "tanh", "deg", "rad" -> {
                arity(name, a, 1);
                double x = a.get(0);
                return switch (name) {
                    case "sqrt" -> Math.sqrt(x);
                    case "cbrt" -> Math.cbrt(x);
                    case "abs" -> Math.abs(x);
                    case "exp" -> Math.exp(x);
                    case "ln" -> Math.log(x);
                    case "sin" -> Math.sin(x);
                    case "cos" -> Math.cos(x);
                    case "tan" -> Math.tan(x);
                    case "atan" -> Math.atan(x);
                    case "sinh" -> Math.sinh(x);
                    case "cosh" -> Math.cosh(x);
                    case "tanh" -> Math.tanh(x);
                    case "deg" -> Math.toDegrees(x);
                    default -> Math.toRadians(x);
                };
            }
            case "atan2", "hypot", "pow", "min", "max", "rectJ", "rectTau" -> {
                arity(name, a, 2);
                double x = a.get(0), y = a.get(1);
                return switch (name) {
                    case "atan2" -> Math.atan2(x, y);
                    case "hypot" -> Math.hypot(x, y);
                    case "pow" -> Math.pow(x, y);
                    case "min" -> Math.min(x, y);
                    case "max" -> Math.max(x, y);
                    case "rectJ" -> rectangleJ(x, y);
                    default -> rectangleTauPerTorque(x, y);
                };
            }
            default -> throw error("unknown function '" + name + "'");
        }
    }

    private void arity(String name, List<Double> a, int n) {
        if (a.size() != n) {
            throw error(name + " takes " + n + " argument(s), got " + a.size());
        }
    }

    /** Exact St. Venant J of a w × t rectangle, w ≥ t &gt; 0 (series; see the class comment). */
    static double rectangleJ(double w, double t) {
        checkRectangle(w, t);
        double s = oddSeries(n -> Math.tanh(n * Math.PI * w / (2 * t)) / Math.pow(n, 5));
        return w * t * t * t / 3 * (1 - 192 * t / (Math.pow(Math.PI, 5) * w) * s);
    }

    /** Exact largest torsion shear stress per unit torque of a w × t rectangle, w ≥ t &gt; 0 (series). */
    static double rectangleTauPerTorque(double w, double t) {
        checkRectangle(w, t);
        double s = oddSeries(n -> 1 / (n * n * Math.cosh(n * Math.PI * w / (2 * t))));
        return t * (1 - 8 / (Math.PI * Math.PI) * s) / rectangleJ(w, t);
    }

    private static void checkRectangle(double w, double t) {
        if (!(t > 0) || !(w >= t)) {
            throw new IllegalArgumentException("rectangle series need w ≥ t > 0, got w = " + w + ", t = " + t);
        }
    }

    private static double oddSeries(java.util.function.IntToDoubleFunction f) {
        double s = 0;
        for (int n = 1; n < 2001; n += 2) {
            double term = f.applyAsDouble(n);
            s += term;
            if (Math.abs(term) < 1e-17 * Math.abs(s)) {
                break;
            }
        }
        return s;
    }

    private void skipBlanks() {
        while (pos < text.length() && Character.isWhitespace(text.charAt(pos))) {
            pos++;
        }
    }

    private boolean eat(char c) {
        if (pos < text.length() && text.charAt(pos) == c) {
            pos++;
            return true;
        }
        return false;
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException("expression '" + text + "': " + what + " at column " + (pos + 1));
    }
}
