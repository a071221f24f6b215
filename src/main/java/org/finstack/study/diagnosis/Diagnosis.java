package org.finstack.study.diagnosis;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.finstack.airside.AirSideCorrelation;
import org.finstack.airside.AirSideCorrelations;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.CorrelationFactors;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;
import org.finstack.study.Progress;
import org.finstack.study.cost.CarnotCop;
import org.finstack.study.cost.CleaningCase;
import org.finstack.study.cost.CleaningPayback;
import org.finstack.study.cost.FouledCoil;
import org.finstack.study.cost.SaturationShift;
import org.finstack.study.cost.Tariff;
import org.finstack.study.diagnosis.Measurements.Input;
import org.finstack.study.fouling.DepositLayer;
import org.finstack.study.fouling.FoulingLevel;
import org.finstack.study.fouling.FoulingStudy;
import org.finstack.study.uncertainty.NormalCoverage;

/**
 * A coil's present state inferred from field readings.
 *
 * <p><b>Method.</b> The measured duty Q_m comes from the airflow and the air's enthalpy change
 * ({@link MeasuredDuty}). The rating model is run at the measured conditions (entering air,
 * airflow, saturation temperature, superheat or subcooling held) and an added air-side fouling
 * resistance R_f ({@link FoulingResistances#airSide()}, per unit air-side area) is solved by
 * Brent's method on [0, 0.1] m2 K/W so that the model's capacity on the same basis equals Q_m.
 * The present UA is the model's UA at R_f; the clean coil is the same case with R_f = 0.
 * A coil that delivers at least the clean model's duty is reported clean (R_f = 0, a warning
 * says by how much it exceeds it).
 *
 * <p><b>Fouling level</b> (resistance-based): the inferred air-side fouling resistance of the
 * whole coil, R_f / (eta_o A_o) [K/W], as a fraction of the clean coil's total resistance
 * 1 / UA_clean: level = R_f UA_clean / (eta_o A_o). 0 is clean; 1 means the dirt holds back as
 * much heat as the whole clean coil did (UA halved).
 *
 * <p><b>Uncertainty: linear propagation</b> (JCGM 100:2008, the GUM, eq. 10, inputs
 * uncorrelated). Sensitivities by one-sided finite differences of the model: the implicit
 * derivative dR_f/dx = (dQ_m/dx - dQ_model/dx) / (dQ_model/dR_f), then every output through
 * its own dependence on x and R_f. Inputs: each reading with its stated accuracy (standard
 * uncertainty a / sqrt 3, {@link Reading}), and the air-side correlation's j, whose factor s has
 * the standard deviation sigma_j of its published scatter ({@link NormalCoverage}). The j term
 * is found by diagnosing again with the correlation's j times s = 1 + sigma_j
 * ({@link CorrelationFactors} on the case): the clean coil re-rated and R_f solved anew, so the
 * whole model (air film, fin efficiency, wet-coil split) responds; its difference from the
 * nominal diagnosis is that input's contribution to every output. A better air film leaves
 * more of the measured shortfall to the dirt: the j scatter moves the fouling, the clean UA and
 * capacity and the loss much more than the present UA or capacity. Ranges are value ∓ 1.2816 u
 * (10th to 90th percentile of a normal distribution), held at zero for R_f and the levels.
 *
 * <p><b>Deposit level from the duty.</b> The same loss in the physical terms of the fouling study
 * ({@link FoulingLevel}): a dust layer of thickness delta and conductivity k
 * ({@link FoulingLevel#DUST_CONDUCTIVITY}) whose "thermal" case (the clean coil with delta / k
 * added to its air-side fouling, at the airflow through the coil) delivers the measured duty.
 * At the measured airflow that case is the one rated at R_f, so delta = k R_f exactly, with
 * u(delta) = k u(R_f); the share of the free-flow area it blocks follows from
 * {@link DepositLayer}. The level rests on the deposit conductivity, which is from memory (see
 * {@link FoulingLevel}) and not in the range. A layer beyond what the passages hold
 * ({@link DepositLayer#maxThickness}) is reported with a warning: dust alone cannot explain
 * such a loss.
 *
 * <p><b>Deposit level from the air pressure drop</b> (when it is measured): the rise of the
 * measured pressure drop over the clean coil's model value at the measured airflow is traced to
 * a deposit thickness by {@link FoulingStudy#infer} (airflow held at the measured value: the
 * fan's share is already in the reading). Its uncertainty by linear propagation at the found
 * thickness: {@code u(delta)^2 = sum (c_x u_x / (d dp / d delta))^2} over the pressure-drop
 * reading (c = 1), the airflow and entering-air readings (c = d dp / d x of the fouled model)
 * and the friction correlation's f, whose factor has the standard deviation sigma_f of its
 * published scatter (c = the change of the fouled model's dp with f times 1 + sigma_f, through
 * {@link CorrelationFactors}). The two levels disagreeing beyond their ranges is reported: the
 * loss is then not (only) a dust layer, or the dust is not the assumed conductivity.
 *
 * <p><b>Payback</b> (when cleaning data are given): the UA lost, f = 1 - UA/UA_clean, on the clean
 * coil's mean temperature difference dT = Q_s,clean / UA_clean shifts the saturation temperature by
 * dT f / (1 - f) ({@link SaturationShift}); the compressor power clean and dirty follows from a
 * Carnot-based COP ({@link CleaningPayback}). A condenser's refrigerating duty is its heat
 * rejection times COP / (1 + COP) at the clean COP.
 *
 * @param measurements  the readings
 * @param basis         whether sensible or total heat was matched
 * @param measuredDuty  Q_m with its uncertainty [W]
 * @param airSideFouling R_f [m2 K/W]
 * @param ua            present UA [W/K]
 * @param cleanUa       clean coil's UA at the same conditions [W/K]
 * @param foulingLevel  resistance-based fouling level [-]
 * @param capacityNow   the model's total capacity at R_f [W]
 * @param capacityClean the clean coil's total capacity at the same conditions [W]
 * @param capacityLossFraction 1 - capacityNow / capacityClean [-]
 * @param depositLevel  the dust layer that explains the measured duty (fouling-study terms)
 * @param depositLevelFromPressureDrop the dust layer that explains the measured air pressure
 *                      drop, if it was measured
 * @param foulingBudget each input's contribution to u(R_f) [m2 K/W], by its key
 * @param now           the rating at R_f
 * @param clean         the clean rating
 * @param ranges        each reading against a healthy coil's range (common practice)
 * @param warnings      what a service engineer should look at
 * @param payback       the cleaning payback, if cleaning data were given
 */
public record Diagnosis(Measurements measurements, MeasuredDuty.Basis basis, Estimate measuredDuty,
        Estimate airSideFouling, Estimate ua, Estimate cleanUa, Estimate foulingLevel, Estimate capacityNow,
        Estimate capacityClean, Estimate capacityLossFraction, Map<String, Double> foulingBudget, Rating now,
        Rating clean, List<HealthyRanges.RangeCheck> ranges, List<String> warnings,
        Optional<CleaningPayback> payback, DepositLevel depositLevel,
        Optional<DepositLevel> depositLevelFromPressureDrop) {

    /** Largest air-side fouling resistance searched [m2 K/W] (the bound FoulingResistances accepts). */
    public static final double MAX_FOULING = 0.1;

    /** Relative tolerance of the matched duty. */
    static final double DUTY_TOLERANCE = 1e-4;

    private static final int MAX_EVALUATIONS = 60;

    /** Stages a diagnosis reports: the nominal solution, seven readings' sensitivities, the j scatter. */
    private static final int STAGES = 9;

    /** Copies the collections. */
    public Diagnosis {
        foulingBudget = Map.copyOf(foulingBudget);
        ranges = List.copyOf(ranges);
        warnings = List.copyOf(warnings);
    }

    /**
     * Diagnoses a coil.
     *
     * @param template     the coil, refrigerant and fouling parts (its air-side fouling must be zero:
     *                     it is what is inferred)
     * @param measurements the readings
     * @param cleaning     payback inputs, or {@code null}
     * @return the diagnosis
     */
    public static Diagnosis of(CoilCase template, Measurements measurements, CleaningInputs cleaning) {
        return of(template, measurements, cleaning, Progress.NONE);
    }

    /**
     * Diagnoses a coil, reporting each stage done (the nominal solution, each reading's
     * sensitivity, the correlation's scatter) and stopping between stages when asked.
     *
     * @param template     the coil, refrigerant and fouling parts (its air-side fouling must be zero:
     *                     it is what is inferred)
     * @param measurements the readings
     * @param cleaning     payback inputs, or {@code null}
     * @param progress     hears of each stage done; checked for cancellation between stages
     * @return the diagnosis
     * @throws CancellationException when {@code progress} asks to stop
     */
    public static Diagnosis of(CoilCase template, Measurements measurements, CleaningInputs cleaning,
            Progress progress) {
        if (template.fouling().airSide() != 0) {
            throw new InputException("fouling.airSide", Msg.IMPOSSIBLE,
                    "is what diagnose infers from the readings; leave it out of a measurement file");
        }
        return new Solver(template, measurements, progress).run(cleaning);
    }

    /** The outputs whose uncertainty is propagated. */
    private record Outputs(double fouling, double ua, double cleanUa, double level, double now, double clean) {

        double loss() {
            return 1 - now / clean;
        }

        double[] all() {
            return new double[] {fouling, ua, cleanUa, level, now, clean, loss()};
        }
    }

    private static final class Solver {
        private final CoilCase template;
        private final Measurements m;
        private final MeasuredDuty.Basis basis;
        private final Warnings warnings = new Warnings();
        private final Progress progress;
        private int stage;

        Solver(CoilCase template, Measurements m, Progress progress) {
            this.template = template;
            this.m = m;
            this.basis = MeasuredDuty.basis(m);
            this.progress = progress;
        }

        /** Reports one more stage of {@link #STAGES} done, then stops if asked. */
        private void stageDone() {
            progress.step(++stage, STAGES);
            if (progress.cancelled()) {
                throw new CancellationException("diagnosis cancelled");
            }
        }

        private Rating rate(Measurements readings, double fouling) {
            return rate(readings, fouling, template.factors());
        }

        private Rating rate(Measurements readings, double fouling, CorrelationFactors factors) {
            CoilCase c = readings.applyTo(template).withFactors(factors);
            FoulingResistances f = c.fouling();
            return CoilModels.rate(c.withFouling(new FoulingResistances(fouling, f.inside(), f.contact())));
        }

        /** R_f for a measured duty, given the clean rating at the same readings. */
        private double solveFouling(Measurements readings, double duty, Rating cleanRating) {
            return solveFouling(readings, duty, cleanRating, template.factors());
        }

        /** R_f for a measured duty with the given correlation factors, given the clean rating with them. */
        private double solveFouling(Measurements readings, double duty, Rating cleanRating, CorrelationFactors k) {
            double q0 = basis.of(cleanRating);
            if (duty >= q0) {
                return 0;
            }
            double lo = 0;
            double hi = Math.min(MAX_FOULING, 2e-4);
            double fHi = basis.of(rate(readings, hi, k)) - duty;
            while (fHi > 0) {
                if (hi >= MAX_FOULING) {
                    throw new InputException("measured.airOutletTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                            "the measured duty %.0f W is below what this coil delivers even with %s m2 K/W of air-side "
                                    + "fouling (%.0f W); check the airflow and the temperature readings",
                            duty, MAX_FOULING, fHi + duty));
                }
                lo = hi;
                hi = Math.min(MAX_FOULING, hi * 4);
                fHi = basis.of(rate(readings, hi, k)) - duty;
            }
            BrentSolver brent = new BrentSolver(1e-12, 1e-9);
            double a = lo;
            double b = hi;
            try {
                return brent.solve(MAX_EVALUATIONS, r -> (basis.of(rate(readings, r, k)) - duty) / duty, a, b);
            } catch (TooManyEvaluationsException e) {
                throw new ConvergenceException("air-side fouling resistance", MAX_EVALUATIONS, b - a);
            }
        }

        Diagnosis run(CleaningInputs cleaning) {
            double qm = MeasuredDuty.of(m, basis);
            Rating clean = rate(m, 0);
            double r = solveFouling(m, qm, clean);
            Rating now = r == 0 ? clean : rate(m, r);
            if (r == 0) {
                double above = qm / basis.of(clean) - 1;
                warnings.add(String.format(Locale.ROOT, "the measured %s duty is %.1f %% above what the clean coil's "
                        + "model gives: no fouling can be inferred (the air-side correlation's scatter, or the readings)",
                        basis.id(), 100 * above));
            }
            double h = now.airCoefficient();
            // one extra rating for dQ/dR_f, stepping down where a step up would leave the searched range
            double dR = r + 0.05 / h <= MAX_FOULING ? 0.05 / h : -0.05 / h;
            Rating nowPlus = rate(m, r + dR);
            double dqdR = (basis.of(nowPlus) - basis.of(now)) / dR;
            double dTotaldR = (nowPlus.capacity() - now.capacity()) / dR;
            double dUadR = (nowPlus.ua() - now.ua()) / dR;
            double perR = now.resistances().airFouling() > 0 ? now.resistances().airFouling() / r
                    : nowPlus.resistances().airFouling() / (r + dR);
            stageDone();
            Outputs base = new Outputs(r, now.ua(), clean.ua(), r * perR * clean.ua(), now.capacity(), clean.capacity());
            double[] y0 = base.all();
            double[] u2 = new double[y0.length];
            double uDuty2 = 0;
            Map<String, Double> budget = new LinkedHashMap<>();
            Map<Input, Double> steps = new EnumMap<>(Input.class);
            steps.put(Input.AIR_INLET_TEMPERATURE, 0.2);
            steps.put(Input.AIR_OUTLET_TEMPERATURE, 0.2);
            steps.put(Input.AIR_INLET_HUMIDITY, 0.05);
            steps.put(Input.AIR_OUTLET_HUMIDITY, 0.05);
            steps.put(Input.VOLUME_FLOW, 0.05 * m.volumeFlow().value());
            steps.put(Input.SATURATION_TEMPERATURE, 0.2);
            steps.put(Input.OUTLET_CONDITION, 0.2);
            for (Map.Entry<Input, Double> e : steps.entrySet()) {
                Input in = e.getKey();
                Reading reading = m.get(in);
                stageDone();
                if (reading == null || reading.accuracy() == 0) {
                    continue;
                }
                double step = direction(in, reading.value()) * e.getValue();
                Measurements moved = m.with(in, reading.value() + step);
                double qmMoved = MeasuredDuty.of(moved, basis);
                Outputs y;
                if (in == Input.AIR_OUTLET_TEMPERATURE || in == Input.AIR_OUTLET_HUMIDITY) {
                    double dRf = (qmMoved - qm) / dqdR;
                    double rf = r + dRf;
                    y = new Outputs(rf, now.ua() + dUadR * dRf, clean.ua(), rf * perR * clean.ua(),
                            now.capacity() + dTotaldR * dRf, clean.capacity());
                } else {
                    Rating n = rate(moved, r);
                    Rating c = rate(moved, 0);
                    double dRf = (qmMoved - qm - (basis.of(n) - basis.of(now))) / dqdR;
                    double rf = r + dRf;
                    y = new Outputs(rf, n.ua() + dUadR * dRf, c.ua(), rf * perR * c.ua(), n.capacity() + dTotaldR * dRf,
                            c.capacity());
                }
                double u = reading.standardUncertainty();
                double[] yi = y.all();
                for (int k = 0; k < yi.length; k++) {
                    double c = (yi[k] - y0[k]) / step * u;
                    u2[k] += c * c;
                }
                double cDuty = (qmMoved - qm) / step * u;
                uDuty2 += cDuty * cDuty;
                budget.put(in == Input.OUTLET_CONDITION ? m.outletConditionName() : in.key(),
                        Math.abs((yi[0] - y0[0]) / step * u));
            }
            // the air-side correlation's j scatter: the diagnosis again with j x (1 + sigma_j)
            AirSideCorrelation corr = AirSideCorrelations.standard("coil.finType", template.coil().finType());
            double sigmaJ = NormalCoverage.sigma(corr.scatterJ(), corr.scatterBand());
            CorrelationFactors centre = template.factors();
            CorrelationFactors jUp = new CorrelationFactors(centre.j() * (1 + sigmaJ), centre.f());
            Rating cleanJ = rate(m, 0, jUp);
            double rJ;
            try {
                rJ = solveFouling(m, qm, cleanJ, jUp);
            } catch (InputException e) {
                rJ = MAX_FOULING;
                warnings.add("with the air-side correlation's j at the top of its scatter the readings would need more"
                        + " than the " + MAX_FOULING + " m2 K/W this diagnosis searches: that term is cut there, so the"
                        + " upper ends of the fouling ranges are understated");
            }
            Rating nowJ = rJ == 0 ? cleanJ : rate(m, rJ, jUp);
            double perRJ = rJ > 0 && nowJ.resistances().airFouling() > 0 ? nowJ.resistances().airFouling() / rJ : perR;
            Outputs yj = new Outputs(rJ, nowJ.ua(), cleanJ.ua(), rJ * perRJ * cleanJ.ua(), nowJ.capacity(),
                    cleanJ.capacity());
            double[] yjs = yj.all();
            for (int k = 0; k < yjs.length; k++) {
                double c = yjs[k] - y0[k];
                u2[k] += c * c;
            }
            budget.put("airSideCorrelation.j", Math.abs(rJ - r));
            stageDone();
            Estimate fouling = Estimate.of(r, Math.sqrt(u2[0]), true);
            Estimate level = Estimate.of(y0[3], Math.sqrt(u2[3]), true);
            checkMassFlow(now);
            List<HealthyRanges.RangeCheck> ranges = HealthyRanges.check(m, now.geometry().faceArea());
            for (HealthyRanges.RangeCheck rc : ranges) {
                if (!rc.typical()) {
                    warnings.add(String.format(Locale.ROOT, "%s %.2f %s is %s for a healthy %s (%s: %s to %s %s)",
                            rc.name(), rc.value(), rc.unit(), rc.status(), m.duty().id(), HealthyRanges.BASIS,
                            trim(rc.low()), trim(rc.high()), rc.unit()));
                }
            }
            now.warnings().forEach(warnings::add);
            Optional<CleaningPayback> payback = cleaning == null ? Optional.empty()
                    : Optional.of(payback(cleaning, now, clean));
            double k = FoulingLevel.DUST_CONDUCTIVITY;
            DepositLevel fromDuty = DepositLevel.of(template.coil(),
                    Estimate.of(k * r, k * fouling.standardUncertainty(), true), k);
            if (fromDuty.beyondModel()) {
                warnings.add(String.format(Locale.ROOT, "the lost duty would need a dust layer %s mm thick (at %s W/(m K)),"
                        + " more than this coil's passages hold (%s mm): dust on the fins alone cannot explain it; look at"
                        + " the refrigerant side (charge, expansion valve, inside fouling) and the readings",
                        trim(fromDuty.thickness().value() * 1e3), trim(k), trim(fromDuty.maxThickness() * 1e3)));
            }
            Optional<DepositLevel> fromDp = m.airPressureDrop() == null ? Optional.empty()
                    : Optional.of(depositFromPressureDrop(clean, k, corr));
            fromDp.ifPresent(p -> agreement(fromDuty, p));
            return new Diagnosis(m, basis, Estimate.of(qm, Math.sqrt(uDuty2), true), fouling,
                    Estimate.of(y0[1], Math.sqrt(u2[1]), true), Estimate.of(y0[2], Math.sqrt(u2[2]), true), level,
                    Estimate.of(y0[4], Math.sqrt(u2[4]), true), Estimate.of(y0[5], Math.sqrt(u2[5]), true),
                    Estimate.of(y0[6], Math.sqrt(u2[6]), false), budget, now, clean, ranges, warnings.list(), payback,
                    fromDuty, fromDp);
        }

        /** The fouled coil's model air pressure drop at a deposit thickness, for the readings. */
        private double hydraulicDrop(Measurements readings, double thickness, double k, CorrelationFactors f) {
            CoilCase c = readings.applyTo(template).withFactors(f);
            return CoilModels.rate(new FoulingLevel(thickness, k).applyTo(c).hydraulic()).airPressureDrop();
        }

        /** The deposit behind the measured air pressure drop, with its range. */
        private DepositLevel depositFromPressureDrop(Rating clean, double k, AirSideCorrelation corr) {
            Reading dp = m.airPressureDrop();
            CoilCase cleanCase = m.applyTo(template);
            CorrelationFactors f0 = template.factors();
            double rise = dp.value() - clean.airPressureDrop();
            double max = DepositLayer.maxThickness(template.coil());
            double delta = 0;
            if (rise <= 0) {
                warnings.add(String.format(Locale.ROOT, "the measured air pressure drop %s Pa is not above the clean coil's"
                        + " model value %s Pa at the measured airflow: no deposit can be inferred from it (the friction"
                        + " correlation's scatter, or the reading)", trim(dp.value()), trim(clean.airPressureDrop())));
            } else {
                double top = hydraulicDrop(m, max, k, f0);
                if (dp.value() > top) {
                    throw new InputException("measured.airPressureDrop", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                            "is %s Pa; even a %s mm deposit, which nearly closes this coil's passages, gives only %s Pa"
                                    + " at the measured airflow (%s Pa clean): check the reading and the airflow",
                            trim(dp.value()), trim(max * 1e3), trim(top), trim(clean.airPressureDrop())));
                }
                delta = FoulingStudy.infer(cleanCase, null, k, rise).level().thickness();
            }
            // d dp / d delta between two layers on the fouled side of the found one
            double h = Math.max(1e-6, 0.05 * delta);
            double a = delta == 0 ? h : delta;
            double b = a + h;
            if (b > max) {
                b = delta;
                a = delta - h;
            }
            double slope = (hydraulicDrop(m, b, k, f0) - hydraulicDrop(m, a, k, f0)) / (b - a);
            if (!(slope > 0)) {
                throw new InputException("measured.airPressureDrop", Msg.IMPOSSIBLE,
                        "cannot be traced to a deposit: this coil's modelled pressure drop does not rise with it");
            }
            double dp0 = hydraulicDrop(m, delta, k, f0);
            double u2 = Math.pow(dp.standardUncertainty() / slope, 2);
            for (Input in : new Input[] {Input.VOLUME_FLOW, Input.AIR_INLET_TEMPERATURE}) {
                Reading reading = m.get(in);
                if (reading.accuracy() == 0) {
                    continue;
                }
                double step = direction(in, reading.value()) * (in == Input.VOLUME_FLOW ? 0.05 * reading.value() : 0.2);
                double moved = hydraulicDrop(m.with(in, reading.value() + step), delta, k, f0);
                u2 += Math.pow((moved - dp0) / step * reading.standardUncertainty() / slope, 2);
            }
            double sigmaF = NormalCoverage.sigma(corr.scatterF(), corr.scatterBand());
            double withF = hydraulicDrop(m, delta, k, new CorrelationFactors(f0.j(), f0.f() * (1 + sigmaF)));
            u2 += Math.pow((withF - dp0) / slope, 2);
            return DepositLevel.of(template.coil(), Estimate.of(delta, Math.sqrt(u2), true), k);
        }

        /** Says so when the two deposit levels' ranges do not overlap. */
        private void agreement(DepositLevel fromDuty, DepositLevel fromDp) {
            Estimate a = fromDuty.thickness();
            Estimate b = fromDp.thickness();
            if (a.high() < b.low() || b.high() < a.low()) {
                warnings.add(String.format(Locale.ROOT, "the deposit the lost duty implies (%s mm, %s to %s) and the one the"
                        + " air pressure drop implies (%s mm, %s to %s) disagree: the loss is not (only) a dust layer of"
                        + " the assumed conductivity (%s W/(m K)) - %s", trim(a.value() * 1e3), trim(a.low() * 1e3),
                        trim(a.high() * 1e3), trim(b.value() * 1e3), trim(b.low() * 1e3), trim(b.high() * 1e3),
                        trim(fromDuty.conductivity()), a.value() > b.value()
                                ? "more duty is lost than the pressure drop explains: look at the refrigerant side too"
                                : "the pressure drop rose more than the duty fell: a fibrous or oily deposit on the face,"
                                        + " or the airflow reading"));
            }
        }

        /** Steps go inwards where a reading sits at a bound (humidity 1, superheat 0). */
        private double direction(Input in, double value) {
            return switch (in) {
                case AIR_INLET_HUMIDITY, AIR_OUTLET_HUMIDITY -> value > 0.5 ? -1 : 1;
                case AIR_INLET_TEMPERATURE -> m.duty() == Duty.EVAPORATOR ? 1 : -1;
                case AIR_OUTLET_TEMPERATURE ->
                        m.duty() == Duty.CONDENSER || m.airInletTemperature().value() - value > 1 ? 1 : -1;
                default -> 1;
            };
        }

        private void checkMassFlow(Rating now) {
            Reading mf = m.refrigerantMassFlow();
            if (mf == null || now.refrigerant() == null) {
                return;
            }
            double model = now.refrigerant().massFlow();
            double diff = mf.value() / model - 1;
            if (Math.abs(diff) > 0.1) {
                warnings.add(String.format(Locale.ROOT, "the measured refrigerant mass flow %.4f kg/s differs by %+.0f %% "
                        + "from the %.4f kg/s the diagnosed coil passes at these readings: check the flow meter, the "
                        + "superheat or subcooling reading, and the air-side readings", mf.value(), 100 * diff, model));
            }
        }

        private CleaningPayback payback(CleaningInputs ci, Rating now, Rating clean) {
            double f = Math.max(0, 1 - now.ua() / clean.ua());
            double dT = clean.moisture().sensibleCapacity() / clean.ua();
            double shift = f == 0 ? 0 : SaturationShift.fromCapacityLoss(f, dT);
            double sat = m.saturationTemperature().value();
            boolean evaporator = m.duty() == Duty.EVAPORATOR;
            double tEvap = evaporator ? sat + shift : ci.otherSaturationTemperature();
            double tCond = evaporator ? ci.otherSaturationTemperature() : sat - shift;
            String other = evaporator ? "cleaning.condensingTemperature" : "cleaning.evaporatingTemperature";
            if (!(tCond > tEvap)) {
                throw new InputException(other, Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "the condensing temperature (%.1f C) must lie above the evaporating temperature (%.1f C)",
                        tCond - 273.15, tEvap - 273.15));
            }
            double duty = now.capacity();
            if (!evaporator) {
                double cop = CarnotCop.cop(tEvap, tCond, ci.secondLawEfficiency(), Warnings.discard());
                duty = duty * cop / (1 + cop);
            }
            CleaningCase cc = new CleaningCase(evaporator ? FouledCoil.EVAPORATOR : FouledCoil.CONDENSER, duty, tEvap,
                    tCond, shift, ci.secondLawEfficiency(), ci.runHours() * CleaningCase.SECONDS_PER_HOUR,
                    new Tariff(ci.pricePerKwh(), ci.currency()), ci.cost());
            return CleaningPayback.of(cc, warnings);
        }

        private static String trim(double v) {
            return org.finstack.core.Numbers.brief(v);
        }
    }
}
