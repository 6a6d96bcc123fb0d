package org.fatefield.circuits.sim;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.circuits.random.RandomStreams;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;


/** RK4 against Hipparchus' adaptive Dormand–Prince 8(5,3) at tight tolerance as the reference. */
class RungeKutta4StepperTest {

    @Test
    void matchesDormandPrinceOnTheSwitch() {
        SelfActivatingSwitch circuit = SelfActivatingSwitch.of("A", "B",
                new GeneKinetics(0.1, 0.6, 0.5, 4, 1.2, 0.5, 4, 1.0),
                new GeneKinetics(0.08, 0.5, 0.6, 3, 1.0, 0.45, 4, 0.9));
        double[] p = circuit.defaultParameters();
        double[] x0 = {0.9, 0.2};
        double tEnd = 5.0;

        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return circuit.drift(y, p);
            }
        };
        DormandPrince853Integrator reference = new DormandPrince853Integrator(1e-8, 1.0, 1e-13, 1e-13);
        ODEStateAndDerivative end = reference.integrate(ode, new ODEState(0.0, x0.clone()), tEnd);

        double[] x = x0.clone();
        RungeKutta4Stepper rk4 = RungeKutta4Stepper.of(circuit);
        double dt = 0.005;
        for (int i = 0; i < Math.round(tEnd / dt); i++) {
            rk4.advance(x, p, dt, null);
        }
        // Global error of RK4 is O(dt^4): about 1e-10 here (Hairer, Norsett & Wanner 1993, II.3).
        assertEquals(end.getPrimaryState()[0], x[0], 1e-8);
        assertEquals(end.getPrimaryState()[1], x[1], 1e-8);

        // Langevin with the noise switched off (a huge system size) is explicit Euler: error O(dt).
        double[] z = x0.clone();
        LangevinStepper euler = LangevinStepper.of(circuit, 1e30);
        UniformRandomProvider rng = RandomStreams.of(1).stream(1);
        for (int i = 0; i < 50_000; i++) {
            euler.advance(z, p, 1e-4, rng);
        }
        assertEquals(end.getPrimaryState()[0], z[0], 1e-4);
        assertEquals(end.getPrimaryState()[1], z[1], 1e-4);

        double[] y = x0.clone();
        DormandPrinceStepper adaptive = DormandPrinceStepper.of(circuit, 1e-11);
        for (int i = 0; i < 5; i++) {
            adaptive.advance(y, p, 1.0, null);
        }
        assertEquals(end.getPrimaryState()[0], y[0], 1e-8);
        assertEquals(end.getPrimaryState()[1], y[1], 1e-8);
    }
}
