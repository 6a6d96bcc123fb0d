package org.fatefield.circuits.expr;

import java.util.List;

/**
 * A node of a parsed rate law. The tree holds only numbers, variables and the operations of
 * {@link Operator} and {@link Function}: nothing in a rate law can run code.
 */
public sealed interface Node {

    /** A number. */
    record Constant(double value) implements Node {
    }

    /** A species (concentration) or parameter, resolved to its slot. */
    record Variable(String name, boolean species, int index) implements Node {
    }

    /** Unary minus. */
    record Negate(Node argument) implements Node {
    }

    /** A binary arithmetic operation. */
    record Binary(Operator operator, Node left, Node right) implements Node {
    }

    /** A call of a built-in function. */
    record Call(Function function, List<Node> arguments) implements Node {

        /** Copies the arguments. */
        public Call {
            arguments = List.copyOf(arguments);
        }
    }

    /** Binary operators. */
    enum Operator {
        ADD("+"), SUBTRACT("-"), MULTIPLY("*"), DIVIDE("/"), POWER("^");

        private final String symbol;

        Operator(String symbol) {
            this.symbol = symbol;
        }

        /** How it is written. */
        public String symbol() {
            return symbol;
        }
    }

    /** Built-in functions and their number of arguments. */
    enum Function {
        EXP("exp", 1), LOG("log", 1), SQRT("sqrt", 1), ABS("abs", 1), MIN("min", 2), MAX("max", 2),
        /** {@code hill_act(x, K, n) = x^n / (K^n + x^n)}, with x below zero read as zero. */
        HILL_ACT("hill_act", 3),
        /** {@code hill_rep(x, K, n) = K^n / (K^n + x^n)}, with x below zero read as zero. */
        HILL_REP("hill_rep", 3),
        /** Internal (not writable in a rate law): d hill_act / dx, as {@code HillFunctions.activationSlope}. */
        HILL_SLOPE("#hill_slope", 3),
        /** Internal (not writable in a rate law): 1 where the argument is positive, else 0. */
        STEP("#step", 1);

        private final String word;
        private final int arity;

        Function(String word, int arity) {
            this.word = word;
            this.arity = arity;
        }

        /** Name as written in a rate law. */
        public String word() {
            return word;
        }

        /** Number of arguments. */
        public int arity() {
            return arity;
        }

        /** The function called {@code word}, or null. */
        static Function named(String word) {
            for (Function f : values()) {
                if (f.word.equals(word)) {
                    return f;
                }
            }
            return null;
        }
    }
}
