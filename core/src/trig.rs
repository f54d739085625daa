//! Sine, cosine and tangent for the engine's own angles, without the
//! standard library's argument reduction.
//!
//! In the browser build `f64::sin` and `f64::cos` come from the Rust port
//! of musl's libm, whose reduction of large arguments (`rem_pio2` with its
//! Payne-Hanek tables) is about 5 KB of the wasm on its own. The engine's
//! arguments are small: angles of a section's outline and principal axes
//! (within ±2π) and the secant formula's half-angle θ (below π/2 while the
//! load is below the elastic critical load). So the argument is reduced
//! here by Cody-Waite's method with π/2 split in three parts (exact for
//! `|x|` up to about 2^20·π/2 ≈ 1.6e6), and the reduced value goes through
//! the minimax polynomials of fdlibm's `__kernel_sin` and `__kernel_cos`
//! (the coefficients are those of fdlibm, Sun Microsystems, 1993: "Permission
//! to use, copy, modify, and distribute this software is freely granted,
//! provided that this notice is preserved"; the same coefficients are in
//! musl and in Rust's libm). The tests check every function against the
//! standard library to within 2 units in the last place over ±1000 rad.
//! Beyond 1.6e6 rad the result loses accuracy; the engine never goes there.

// The constants are written as published, to more digits than an f64 holds.
#![allow(clippy::excessive_precision)]

/// π/4.
const PIO4: f64 = std::f64::consts::FRAC_PI_4;
/// 2/π.
const INV_PIO2: f64 = std::f64::consts::FRAC_2_PI;
/// The first 33 bits of π/2 and the rest.
const PIO2_1: f64 = 1.570_796_326_734_125_614_17;
const PIO2_1T: f64 = 6.077_100_506_506_192_249_32e-11;
/// The second 33 bits of π/2 and the rest.
const PIO2_2: f64 = 6.077_100_506_303_965_976_60e-11;
const PIO2_2T: f64 = 2.022_266_248_795_950_631_54e-21;
/// The third 33 bits of π/2 and the rest.
const PIO2_3: f64 = 2.022_266_248_711_166_455_80e-21;
const PIO2_3T: f64 = 8.478_427_660_368_899_569_97e-32;

/// The binary exponent field of `x`.
fn exponent(x: f64) -> i64 {
    ((x.to_bits() >> 52) & 0x7ff) as i64
}

/// `x` as `n·π/2 + (y0 + y1)` with `|y0 + y1| <= π/4` (about).
fn reduce(x: f64) -> (i64, f64, f64) {
    // Rounds x·2/π to the nearest whole number (ties to even).
    let to_int = 1.5 / f64::EPSILON;
    let f = x * INV_PIO2 + to_int - to_int;
    let mut r = x - f * PIO2_1;
    let mut w = f * PIO2_1T;
    let mut y0 = r - w;
    let ex = exponent(x);
    // On cancellation, take the next 33 bits of π/2, then the last ones.
    for (part, tail, bits) in [(PIO2_2, PIO2_2T, 16), (PIO2_3, PIO2_3T, 49)] {
        if ex - exponent(y0) <= bits {
            break;
        }
        let t = r;
        w = f * part;
        r = t - w;
        w = f * tail - ((t - r) - w);
        y0 = r - w;
    }
    let y1 = (r - y0) - w;
    // `f` is a whole number of modest size here; NaN and infinity give 0
    // (and a NaN result through y0).
    (f as i64, y0, y1)
}

/// sin(x + y) for |x + y| <= π/4, `y` the tail of `x`.
fn k_sin(x: f64, y: f64) -> f64 {
    const S1: f64 = -1.666_666_666_666_663_243_48e-1;
    const S2: f64 = 8.333_333_333_322_489_461_24e-3;
    const S3: f64 = -1.984_126_982_985_794_931_34e-4;
    const S4: f64 = 2.755_731_370_707_006_767_89e-6;
    const S5: f64 = -2.505_076_025_340_686_341_95e-8;
    const S6: f64 = 1.589_690_995_211_550_102_21e-10;
    let z = x * x;
    let w = z * z;
    let r = S2 + z * (S3 + z * S4) + z * w * (S5 + z * S6);
    let v = z * x;
    x - ((z * (0.5 * y - v * r) - y) - v * S1)
}

/// cos(x + y) for |x + y| <= π/4, `y` the tail of `x`.
fn k_cos(x: f64, y: f64) -> f64 {
    const C1: f64 = 4.166_666_666_666_660_190_37e-2;
    const C2: f64 = -1.388_888_888_887_410_957_49e-3;
    const C3: f64 = 2.480_158_728_947_672_941_78e-5;
    const C4: f64 = -2.755_731_435_139_066_330_35e-7;
    const C5: f64 = 2.087_572_321_298_174_827_90e-9;
    const C6: f64 = -1.135_964_755_778_819_482_65e-11;
    let z = x * x;
    let w = z * z;
    let r = z * (C1 + z * (C2 + z * C3)) + w * w * (C4 + z * (C5 + z * C6));
    let hz = 0.5 * z;
    let w = 1.0 - hz;
    w + (((1.0 - w) - hz) + (z * r - x * y))
}

/// The sine and cosine of `x` (radians).
pub fn sin_cos(x: f64) -> (f64, f64) {
    if x.abs() <= PIO4 {
        // sin(±0) keeps its sign.
        let s = if x == 0.0 { x } else { k_sin(x, 0.0) };
        return (s, k_cos(x, 0.0));
    }
    let (n, y0, y1) = reduce(x);
    let (s, c) = (k_sin(y0, y1), k_cos(y0, y1));
    match n & 3 {
        0 => (s, c),
        1 => (c, -s),
        2 => (-s, -c),
        _ => (-c, s),
    }
}

/// The sine of `x` (radians).
pub fn sin(x: f64) -> f64 {
    sin_cos(x).0
}

/// The cosine of `x` (radians): the cosine half of [`sin_cos`], with the
/// same value, without working the sine.
pub fn cos(x: f64) -> f64 {
    if x.abs() <= PIO4 {
        return k_cos(x, 0.0);
    }
    let (n, y0, y1) = reduce(x);
    match n & 3 {
        0 => k_cos(y0, y1),
        1 => -k_sin(y0, y1),
        2 => -k_cos(y0, y1),
        _ => k_sin(y0, y1),
    }
}

/// The tangent of `x` (radians), as the ratio of the two (within 3 units
/// in the last place of the standard library's).
pub fn tan(x: f64) -> f64 {
    let (s, c) = sin_cos(x);
    s / c
}

#[cfg(test)]
mod tests {
    #![allow(clippy::disallowed_methods)]
    // The standard library's functions are the reference here.
    use super::*;
    use proptest::prelude::*;

    /// Units in the last place between two finite values of one sign
    /// region (both small, or close).
    fn ulps(a: f64, b: f64) -> f64 {
        let scale = b.abs().max(f64::MIN_POSITIVE);
        let ulp = f64::EPSILON * 2f64.powi(scale.log2().floor() as i32);
        (a - b).abs() / ulp
    }

    proptest! {
        #[test]
        fn cos_is_the_cosine_of_sin_cos(x in -2000.0f64..2000.0) {
            prop_assert_eq!(cos(x).to_bits(), sin_cos(x).1.to_bits());
        }
    }

    #[test]
    fn special_values() {
        assert_eq!(sin(0.0).to_bits(), 0.0f64.to_bits());
        assert_eq!(sin(-0.0).to_bits(), (-0.0f64).to_bits());
        assert_eq!(cos(0.0), 1.0);
        assert!(sin(f64::NAN).is_nan() && cos(f64::NAN).is_nan());
        assert!(sin(f64::INFINITY).is_nan() && cos(f64::NEG_INFINITY).is_nan());
        let (s, c) = sin_cos(std::f64::consts::FRAC_PI_2);
        assert_eq!(s, 1.0);
        assert!(c.abs() < 1e-16, "{c}");
        assert!((cos(std::f64::consts::PI) + 1.0).abs() < 1e-16);
        assert!((tan(std::f64::consts::FRAC_PI_4) - 1.0).abs() < 2.0 * f64::EPSILON);
    }

    #[test]
    fn near_multiples_of_half_pi() {
        // Where the reduction cancels most: the second and third parts of
        // π/2 are needed there.
        for k in -200i32..=200 {
            let x = f64::from(k) * std::f64::consts::FRAC_PI_2;
            for x in [x, x.next_up(), x.next_down()] {
                assert!(
                    ulps(sin(x), x.sin()) <= 2.0,
                    "sin {x}: {} {}",
                    sin(x),
                    x.sin()
                );
                assert!(
                    ulps(cos(x), x.cos()) <= 2.0,
                    "cos {x}: {} {}",
                    cos(x),
                    x.cos()
                );
            }
        }
    }

    proptest! {
        #[test]
        fn agrees_with_the_standard_library(x in -1000.0f64..1000.0) {
            prop_assert!(ulps(sin(x), x.sin()) <= 2.0, "sin {}: {} {}", x, sin(x), x.sin());
            prop_assert!(ulps(cos(x), x.cos()) <= 2.0, "cos {}: {} {}", x, cos(x), x.cos());
            let t = x.tan();
            if t.abs() < 1e8 {
                prop_assert!(ulps(tan(x), t) <= 3.0, "tan {}: {} {}", x, tan(x), t);
            }
        }

        #[test]
        fn small_angles_agree(x in -1.0e-3f64..1.0e-3) {
            prop_assert!(ulps(sin(x), x.sin()) <= 1.0);
            prop_assert!(ulps(cos(x), x.cos()) <= 1.0);
        }
    }
}
