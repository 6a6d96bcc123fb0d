package org.fatefield.circuits.expr;

import java.util.List;

/** Node constructors that fold constants and drop neutral elements, so derivatives stay small. */
final class Simplify {

    static final Node ZERO = new Node.Constant(0);
    static final Node ONE = new Node.Constant(1);

    private Simplify() {
    }

    static boolean isConstant(Node node, double value) {
        return node instanceof Node.Constant c && c.value() == value;
    }

    static Node add(Node a, Node b) {
        if (isConstant(a, 0)) {
            return b;
        }
        if (isConstant(b, 0)) {
            return a;
        }
        if (a instanceof Node.Constant x && b instanceof Node.Constant y) {
            return new Node.Constant(x.value() + y.value());
        }
        return new Node.Binary(Node.Operator.ADD, a, b);
    }

    static Node subtract(Node a, Node b) {
        if (isConstant(b, 0)) {
            return a;
        }
        if (isConstant(a, 0)) {
            return negate(b);
        }
        if (a instanceof Node.Constant x && b instanceof Node.Constant y) {
            return new Node.Constant(x.value() - y.value());
        }
        return new Node.Binary(Node.Operator.SUBTRACT, a, b);
    }

    static Node multiply(Node a, Node b) {
        if (isConstant(a, 0) || isConstant(b, 0)) {
            return ZERO;
        }
        if (isConstant(a, 1)) {
            return b;
        }
        if (isConstant(b, 1)) {
            return a;
        }
        if (a instanceof Node.Constant x && b instanceof Node.Constant y) {
            return new Node.Constant(x.value() * y.value());
        }
        return new Node.Binary(Node.Operator.MULTIPLY, a, b);
    }

    static Node divide(Node a, Node b) {
        if (isConstant(a, 0)) {
            return ZERO;
        }
        if (isConstant(b, 1)) {
            return a;
        }
        if (a instanceof Node.Constant x && b instanceof Node.Constant y) {
            return new Node.Constant(x.value() / y.value());
        }
        return new Node.Binary(Node.Operator.DIVIDE, a, b);
    }

    static Node power(Node a, Node b) {
        if (isConstant(b, 0)) {
            return ONE;
        }
        if (isConstant(b, 1)) {
            return a;
        }
        if (a instanceof Node.Constant x && b instanceof Node.Constant y) {
            return new Node.Constant(Math.pow(x.value(), y.value()));
        }
        return new Node.Binary(Node.Operator.POWER, a, b);
    }

    static Node negate(Node a) {
        if (a instanceof Node.Constant c) {
            return new Node.Constant(-c.value());
        }
        if (a instanceof Node.Negate n) {
            return n.argument();
        }
        return new Node.Negate(a);
    }

    static Node call(Node.Function f, Node... arguments) {
        return new Node.Call(f, List.of(arguments));
    }
}
