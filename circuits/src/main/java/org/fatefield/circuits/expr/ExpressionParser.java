package org.fatefield.circuits.expr;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads a rate law written in ordinary math notation into a {@link Node} tree.
 *
 * <p>Grammar (recursive descent; {@code ^} binds tighter than unary minus and is right
 * associative, so {@code -x^2 = -(x^2)} and {@code 2^3^2 = 2^9}):
 * <pre>
 *   sum     = product (("+" | "-") product)*
 *   product = unary (("*" | "/") unary)*
 *   unary   = "-" unary | "+" unary | power
 *   power   = atom ("^" unary)?
 *   atom    = number | name | name "(" sum ("," sum)* ")" | "(" sum ")"
 * </pre>
 * Names are species or parameters of the circuit, or the functions of {@link Node.Function}.
 * Anything else is an error that names the column. A rate law is at most {@value #MAX_LENGTH}
 * characters and {@value #MAX_TERMS} terms, nested at most {@value #MAX_NESTING} deep, so that
 * no scenario can exhaust the stack of the parser, the differentiator or the evaluator.
 */
public final class ExpressionParser {

    /** Longest rate law, in characters. */
    public static final int MAX_LENGTH = 20_000;
    /** Most numbers, names and operators in one rate law. */
    public static final int MAX_TERMS = 2_000;
    /** Deepest nesting of parentheses, signs, powers and function calls. */
    public static final int MAX_NESTING = 100;

    private final String text;
    private final List<String> species;
    private final List<String> parameters;
    private int position;
    private int nesting;
    private int terms;

    private ExpressionParser(String text, List<String> species, List<String> parameters) {
        this.text = text;
        this.species = species;
        this.parameters = parameters;
    }

    /**
     * Parses {@code text}.
     *
     * @param species    names that read a species concentration
     * @param parameters names that read a parameter
     * @throws ExpressionException with the column of the first problem
     */
    public static Node parse(String text, List<String> species, List<String> parameters) {
        if (text.length() > MAX_LENGTH) {
            throw new ExpressionException("the rate law is " + text.length() + " characters long; at most "
                    + MAX_LENGTH + " are allowed (split it with parameters or more reactions)", MAX_LENGTH + 1);
        }
        ExpressionParser parser = new ExpressionParser(text, species, parameters);
        parser.skipSpace();
        if (parser.atEnd()) {
            throw new ExpressionException("the rate law is empty", 1);
        }
        Node node = parser.sum();
        parser.skipSpace();
        if (!parser.atEnd()) {
            throw new ExpressionException("unexpected '" + parser.peek() + "' after a complete expression",
                    parser.position + 1);
        }
        return node;
    }

    private Node sum() {
        Node left = product();
        while (true) {
            skipSpace();
            if (accept('+')) {
                left = new Node.Binary(Node.Operator.ADD, left, product());
            } else if (accept('-')) {
                left = new Node.Binary(Node.Operator.SUBTRACT, left, product());
            } else {
                return left;
            }
        }
    }

    private Node product() {
        Node left = unary();
        while (true) {
            skipSpace();
            if (accept('*')) {
                left = new Node.Binary(Node.Operator.MULTIPLY, left, unary());
            } else if (accept('/')) {
                left = new Node.Binary(Node.Operator.DIVIDE, left, unary());
            } else {
                return left;
            }
        }
    }

    /** Counts one more term, refusing a rate law with too many. */
    private void term() {
        if (++terms > MAX_TERMS) {
            throw new ExpressionException("the rate law has more than " + MAX_TERMS + " terms; split it with"
                    + " parameters or more reactions", position + 1);
        }
    }

    /** Enters one level of nesting, refusing a rate law nested too deep. */
    private void enter() {
        if (++nesting > MAX_NESTING) {
            throw new ExpressionException("the rate law nests deeper than " + MAX_NESTING + " levels (parentheses,"
                    + " signs, powers and calls); write it flatter", position + 1);
        }
    }

    private Node unary() {
        enter();
        try {
            return signed();
        } finally {
            nesting--;
        }
    }

    private Node signed() {
        skipSpace();
        if (accept('-')) {
            return new Node.Negate(unary());
        }
        if (accept('+')) {
            return unary();
        }
        return power();
    }

    private Node power() {
        Node base = atom();
        skipSpace();
        if (accept('^')) {
            return new Node.Binary(Node.Operator.POWER, base, unary());
        }
        return base;
    }

    private Node atom() {
        term();
        skipSpace();
        if (atEnd()) {
            throw new ExpressionException("the expression ends where a number, name or '(' was expected",
                    position + 1);
        }
        char c = peek();
        int start = position;
        if (c == '(') {
            position++;
            Node inner = sum();
            expect(')', start);
            return inner;
        }
        if (Character.isDigit(c) || c == '.') {
            return number();
        }
        if (Character.isLetter(c) || c == '_') {
            String name = name();
            skipSpace();
            if (!atEnd() && peek() == '(') {
                return call(name, start);
            }
            int s = species.indexOf(name);
            if (s >= 0) {
                return new Node.Variable(name, true, s);
            }
            int p = parameters.indexOf(name);
            if (p >= 0) {
                return new Node.Variable(name, false, p);
            }
            throw new ExpressionException("unknown name '" + name + "'; species are " + species
                    + ", parameters are " + parameters, start + 1);
        }
        throw new ExpressionException("unexpected '" + c + "' where a number, name or '(' was expected", start + 1);
    }

    private Node call(String name, int start) {
        Node.Function function = Node.Function.named(name);
        if (function == null) {
            throw new ExpressionException("unknown function '" + name + "'; functions are "
                    + Arrays.stream(Node.Function.values()).map(Node.Function::word).toList(), start + 1);
        }
        position++;
        List<Node> arguments = new ArrayList<>();
        skipSpace();
        if (!accept(')')) {
            do {
                arguments.add(sum());
                skipSpace();
            } while (accept(','));
            expect(')', start);
        }
        if (arguments.size() != function.arity()) {
            throw new ExpressionException(name + " takes " + function.arity() + " argument"
                    + (function.arity() == 1 ? "" : "s") + ", got " + arguments.size(), start + 1);
        }
        return new Node.Call(function, arguments);
    }

    private Node number() {
        int start = position;
        while (!atEnd() && (Character.isDigit(peek()) || peek() == '.')) {
            position++;
        }
        if (!atEnd() && (peek() == 'e' || peek() == 'E')) {
            int mark = position;
            position++;
            if (!atEnd() && (peek() == '+' || peek() == '-')) {
                position++;
            }
            if (atEnd() || !Character.isDigit(peek())) {
                position = mark;
            }
            while (!atEnd() && Character.isDigit(peek())) {
                position++;
            }
        }
        String literal = text.substring(start, position);
        try {
            return new Node.Constant(Double.parseDouble(literal));
        } catch (NumberFormatException e) {
            throw new ExpressionException("'" + literal + "' is not a number", start + 1);
        }
    }

    private String name() {
        int start = position;
        while (!atEnd() && (Character.isLetterOrDigit(peek()) || peek() == '_')) {
            position++;
        }
        return text.substring(start, position);
    }

    private void expect(char c, int openedAt) {
        skipSpace();
        if (!accept(c)) {
            throw new ExpressionException("missing '" + c + "' to close the '(' at column " + (openedAt + 1),
                    position + 1);
        }
    }

    private boolean accept(char c) {
        if (!atEnd() && peek() == c) {
            position++;
            return true;
        }
        return false;
    }

    private void skipSpace() {
        while (!atEnd() && Character.isWhitespace(peek())) {
            position++;
        }
    }

    private boolean atEnd() {
        return position >= text.length();
    }

    private char peek() {
        return text.charAt(position);
    }
}
