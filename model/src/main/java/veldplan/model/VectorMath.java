package veldplan.model;

import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorOperators;

/**
 * Exponential, natural logarithm and power of one vector of doubles, in place in an array, built
 * only from IEEE additions, multiplications, divisions and bit operations. The Vector API's own
 * {@code EXP}, {@code LOG} and {@code POW} give different last bits in interpreted and in
 * compiled code (a per-lane {@link Math#exp} before the JIT compiles a method, a vectorised
 * library after), so a run's numbers would depend on when the JIT got to it, and with them the
 * thread count and a resumed run's output. These give the same bits whenever and however they
 * run, within a few units in the last place of {@link Math}'s.
 *
 * <p>The array form (rather than a vector in, a vector out) keeps the vectors of the caller in
 * registers whether or not the JIT inlines these methods.
 *
 * <p>Methods: exp by Cody–Waite reduction x = k ln 2 + r, |r| &le; ln 2 / 2, and the Taylor
 * polynomial of e^r to degree 13 (truncation below 2e-16 relative), by Estrin's scheme; log by
 * x = 2^e m, m in [sqrt(2)/2, sqrt(2)), log m = 2 atanh(s) with s = (m - 1)/(m + 1), |s| &lt; 0.172, series to
 * s^23 (Abramowitz &amp; Stegun 1964, 4.1.28 and 4.2.1, from memory; the reduction constants are
 * the split of ln 2 used by fdlibm).
 */
final class VectorMath {
  private static final double LOG2E = 1.4426950408889634;
  /** ln 2 split so that k x LN2_HI is exact for |k| &lt; 2^11 (fdlibm's constants). */
  private static final double LN2_HI = 6.93147180369123816490e-01;
  private static final double LN2_LO = 1.90821492927058770002e-10;
  /** 1.5 x 2^52: adding and subtracting it rounds to the nearest integer. */
  private static final double ROUND = 6755399441055744.0;
  private static final long ROUND_BITS = Double.doubleToRawLongBits(ROUND);
  /** Largest x with a finite e^x, and smallest with a normal one. */
  private static final double EXP_MAX = 709.782712893384;
  private static final double EXP_MIN = -708.3964185322641;
  private static final double SQRT_HALF = 0.7071067811865476;
  private static final long MANTISSA = 0x000F_FFFF_FFFF_FFFFL;
  private static final long ONE_BITS = Double.doubleToRawLongBits(1.0);

  private VectorMath() {}

  /**
   * {@link #exp(double[], int)} of {@code vectors} consecutive vectors from {@code at}: one call
   * for many independent exponentials, which the processor then computes overlapped (a single
   * exponential is a chain of dependent operations that leaves most of it idle).
   */
  static void exp(double[] a, int at, int vectors) {
    int lanes = SPECIES.length();
    for (int v = 0; v < vectors; v++) {
      exp(a, at + v * lanes);
    }
  }

  /** a[at .. at + lanes) = e^a[at .. at + lanes); 0 below e^-708.4, +inf above e^709.78. */
  static void exp(double[] a, int at) {
    DoubleVector x = DoubleVector.fromArray(SPECIES, a, at);
    DoubleVector t = x.mul(LOG2E).add(ROUND);
    DoubleVector k = t.sub(ROUND);
    DoubleVector r = x.sub(k.mul(LN2_HI)).sub(k.mul(LN2_LO));
    // Taylor polynomial sum r^i / i!, i = 0..13, by Estrin's scheme (pairs, then pairs of
    // pairs): a short chain of dependent operations instead of Horner's 26.
    DoubleVector r2 = r.mul(r);
    DoubleVector r4 = r2.mul(r2);
    DoubleVector q0 = r.add(1.0);
    DoubleVector q1 = r.mul(1.0 / 6).add(0.5);
    DoubleVector q2 = r.mul(1.0 / 120).add(1.0 / 24);
    DoubleVector q3 = r.mul(1.0 / 5040).add(1.0 / 720);
    DoubleVector q4 = r.mul(1.0 / 362880).add(1.0 / 40320);
    DoubleVector q5 = r.mul(1.0 / 39916800).add(1.0 / 3628800);
    DoubleVector q6 = r.mul(1.0 / 6227020800.0).add(1.0 / 479001600);
    DoubleVector u0 = q1.mul(r2).add(q0);
    DoubleVector u1 = q3.mul(r2).add(q2);
    DoubleVector u2 = q5.mul(r2).add(q4);
    DoubleVector v0 = u1.mul(r4).add(u0);
    DoubleVector v1 = q6.mul(r4).add(u2);
    DoubleVector p = v1.mul(r4.mul(r4)).add(v0);
    // 2^k from the bits of t, whose low bits hold k: bits(t) - bits(ROUND) = k.
    LongVector kBits = ((LongVector) t.reinterpretAsLongs()).sub(ROUND_BITS);
    if (x.lanewise(VectorOperators.ABS).compare(VectorOperators.LE, 708).allTrue()) {
      // |k| <= 1022: 2^k is a normal double, and p x 2^k is exactly what the general path
      // below gives (multiplying by powers of two is exact while the result is normal).
      p.mul(kBits.add(1023).lanewise(VectorOperators.LSHL, 52).reinterpretAsDoubles())
          .intoArray(a, at);
      return;
    }
    // In general 2^k as 2^k1 x 2^k2, k1 = k >> 1, k2 = k - k1 (each normal for |k| <= 1024).
    LongVector k1 = kBits.lanewise(VectorOperators.ASHR, 1);
    DoubleVector scale1 = k1.add(1023).lanewise(VectorOperators.LSHL, 52).reinterpretAsDoubles();
    DoubleVector scale2 = kBits.sub(k1).add(1023).lanewise(VectorOperators.LSHL, 52)
        .reinterpretAsDoubles();
    p.mul(scale1).mul(scale2)
        .blend(Double.POSITIVE_INFINITY, x.compare(VectorOperators.GT, EXP_MAX))
        .blend(0.0, x.compare(VectorOperators.LT, EXP_MIN))
        .intoArray(a, at);
  }

  /**
   * a[at .. at + lanes) = ln a[at .. at + lanes) for normal positive values; ln 0 = -inf,
   * negative values and NaN give NaN, +inf gives +inf. Subnormal inputs are not supported.
   */
  static void log(double[] a, int at) {
    DoubleVector x = DoubleVector.fromArray(SPECIES, a, at);
    LongVector bits = (LongVector) x.reinterpretAsLongs();
    // x = 2^e m with m in [1, 2); then m in [sqrt(2)/2, sqrt(2)) by halving it above sqrt(2).
    DoubleVector e = (DoubleVector) bits.lanewise(VectorOperators.LSHR, 52).sub(1023)
        .convert(VectorOperators.L2D, 0);
    DoubleVector m = bits.and(MANTISSA).or(ONE_BITS).reinterpretAsDoubles();
    var high = m.compare(VectorOperators.GT, 2 * SQRT_HALF);
    m = m.blend(m.mul(0.5), high);
    e = e.blend(e.add(1), high);
    DoubleVector s = m.sub(1).div(m.add(1));
    DoubleVector s2 = s.mul(s);
    DoubleVector series = s2.mul(1.0 / 23).add(1.0 / 21)
        .mul(s2).add(1.0 / 19)
        .mul(s2).add(1.0 / 17)
        .mul(s2).add(1.0 / 15)
        .mul(s2).add(1.0 / 13)
        .mul(s2).add(1.0 / 11)
        .mul(s2).add(1.0 / 9)
        .mul(s2).add(1.0 / 7)
        .mul(s2).add(1.0 / 5)
        .mul(s2).add(1.0 / 3)
        .mul(s2).mul(s).mul(2);
    DoubleVector logM = s.mul(2).add(series);
    DoubleVector y = e.mul(LN2_HI).add(logM.add(e.mul(LN2_LO)));
    y.blend(Double.NEGATIVE_INFINITY, x.compare(VectorOperators.EQ, 0))
        .blend(Double.NaN, x.compare(VectorOperators.LT, 0).or(x.test(VectorOperators.IS_NAN)))
        .blend(Double.POSITIVE_INFINITY, x.compare(VectorOperators.EQ, Double.POSITIVE_INFINITY))
        .intoArray(a, at);
  }

  /**
   * a[at .. at + lanes) = a^m for a &ge; 0 and m &gt; 0: e^(m ln a), exactly 0 for a = 0, and
   * a itself for m = 1 and a x a for m = 2 (as {@code PreySwitching} computes them).
   */
  static void pow(double[] a, int at, double m) {
    if (m == 1) {
      return;
    }
    DoubleVector x = DoubleVector.fromArray(SPECIES, a, at);
    if (m == 2) {
      x.mul(x).intoArray(a, at);
      return;
    }
    log(a, at);
    DoubleVector.fromArray(SPECIES, a, at).mul(m).intoArray(a, at);
    exp(a, at);
    DoubleVector.fromArray(SPECIES, a, at).blend(0.0, x.compare(VectorOperators.EQ, 0))
        .intoArray(a, at);
  }
}
