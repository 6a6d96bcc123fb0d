package org.fatefield.circuits.expr;

import static org.fatefield.circuits.expr.Simplify.ONE;
import static org.fatefield.circuits.expr.Simplify.ZERO;
import static org.fatefield.circuits.expr.Simplify.add;
import static org.fatefield.circuits.expr.Simplify.call;
import static org.fatefield.circuits.expr.Simplify.divide;
import static org.fatefield.circuits.expr.Simplify.multiply;
import static org.fatefield.circuits.expr.Simplify.negate;
import static org.fatefield.circuits.expr.Simplify.power;
import static org.fatefield.circuits.expr.Simplify.subtract;

import java.util.List;

/**
 * Symbolic differentiation of rate laws, for exact Jacobians. The result is simplified as it is
 * built (constants folded, zeros and ones dropped). {@code min}, {@code max} and {@code abs} are
 * differentiated piecewise (the derivative at a kink is one of the one-sided values).
 */
public final class Differentiator {

    private Differentiator() {
    }

    /** d node / d species {@code index}. */
    public static Node bySpecies(Node node, int index) {
        return derive(node, true, index);
    }

    /** d node / d parameter {@code index}. */
    public static Node byParameter(Node node, int index) {
        return derive(node, false, index);
    }

    private static Node derive(Node node, boolean species, int index) {
        if (node instanceof Node.Constant) {
            return ZERO;
        }
        if (node instanceof Node.Variable v) {
            return v.species() == species && v.index() == index ? ONE : ZERO;
        }
        if (node instanceof Node.Negate n) {
            return negate(derive(n.argument(), species, index));
        }
        if (node instanceof Node.Binary b) {
            return binary(b, derive(b.left(), species, index), derive(b.right(), species, index));
        }
        Node.Call c = (Node.Call) node;
        Node result = ZERO;
        for (int k = 0; k < c.arguments().size(); k++) {
            Node inner = derive(c.arguments().get(k), species, index);
            if (!Simplify.isConstant(inner, 0)) {
                result = add(result, multiply(partial(c.function(), c.arguments(), k), inner));
            }
        }
        return result;
    }

    private static Node binary(Node.Binary b, Node dl, Node dr) {
        Node l = b.left();
        Node r = b.right();
        return switch (b.operator()) {
            case ADD -> add(dl, dr);
            case SUBTRACT -> subtract(dl, dr);
            case MULTIPLY -> add(multiply(dl, r), multiply(l, dr));
            case DIVIDE -> divide(subtract(multiply(dl, r), multiply(l, dr)), power(r, new Node.Constant(2)));
            case POWER -> {
                if (r instanceof Node.Constant c) {
                    yield multiply(multiply(c, power(l, new Node.Constant(c.value() - 1))), dl);
                }
                Node logTerm = multiply(dr, call(Node.Function.LOG, l));
                Node baseTerm = divide(multiply(r, dl), l);
                yield multiply(b, add(logTerm, baseTerm));
            }
        };
    }

    /** Partial derivative of {@code f(args)} with respect to argument {@code k}. */
    private static Node partial(Node.Function f, List<Node> args, int k) {
        Node x = args.get(0);
        return switch (f) {
            case EXP -> call(Node.Function.EXP, x);
            case LOG -> divide(ONE, x);
            case SQRT -> divide(new Node.Constant(0.5), call(Node.Function.SQRT, x));
            case ABS -> subtract(multiply(new Node.Constant(2), call(Node.Function.STEP, x)), ONE);
            case MIN -> k == 0 ? call(Node.Function.STEP, subtract(args.get(1), x))
                    : subtract(ONE, call(Node.Function.STEP, subtract(args.get(1), x)));
            case MAX -> k == 0 ? call(Node.Function.STEP, subtract(x, args.get(1)))
                    : subtract(ONE, call(Node.Function.STEP, subtract(x, args.get(1))));
            case HILL_ACT -> hillPartial(args, k);
            case HILL_REP -> negate(hillPartial(args, k));
            case HILL_SLOPE, STEP -> throw new IllegalStateException(
                    "second derivatives of " + f.word() + " are not needed and not provided");
        };
    }

    /**
     * With r = (x/K)^n and H = r / (1 + r): dH/dx = slope, dH/dK = -(x/K) slope and
     * dH/dn = (x/n) ln(x/K) slope.
     */
    private static Node hillPartial(List<Node> args, int k) {
        Node x = args.get(0);
        Node theta = args.get(1);
        Node n = args.get(2);
        Node slope = call(Node.Function.HILL_SLOPE, x, theta, n);
        return switch (k) {
            case 0 -> slope;
            case 1 -> negate(multiply(divide(x, theta), slope));
            default -> multiply(multiply(divide(x, n), call(Node.Function.LOG, divide(x, theta))), slope);
        };
    }
}
