//! Decoding of the fuzzer's bytes into arguments, shared by the fuzz targets.
//!
//! Every number is read as one mode byte and then either the raw bit pattern of the type (NaN
//! payloads, subnormals, ±0, ±∞, the largest floats: every pattern is reachable), a value from
//! a short list of edge values, or a log-uniform value in a decade range the target names (so
//! that the fuzzer also reaches the successful paths of functions that refuse most raw bit
//! patterns). Exhausted input reads as zero bytes.

use relicore::Real;
use relicore::cosmology::UniverseParameters;

/// The fuzzer's bytes, read front to back.
pub struct Input<'a> {
    data: &'a [u8],
}

/// Edge values every mode-1 read picks from.
const EDGES: [f64; 16] = [
    0.0,
    -0.0,
    f64::MIN_POSITIVE,
    5e-324,
    f64::MAX,
    -f64::MAX,
    f64::INFINITY,
    f64::NEG_INFINITY,
    f64::NAN,
    1.0,
    -1.0,
    f64::EPSILON,
    3.402_823_466_385_288_6e38,
    1.175_494_350_822_287_5e-38,
    1e-300,
    1e300,
];

/// The two types of the core, read from raw bits.
pub trait Float: Real {
    /// The value of the raw bits at the front of the input.
    fn raw(input: &mut Input<'_>) -> Self;
    /// The bits, for bit-for-bit comparisons.
    fn bits(self) -> u64;
}

impl Float for f64 {
    fn raw(input: &mut Input<'_>) -> Self {
        f64::from_bits(input.u64())
    }
    fn bits(self) -> u64 {
        self.to_bits()
    }
}

impl Float for f32 {
    fn raw(input: &mut Input<'_>) -> Self {
        f32::from_bits(input.u32())
    }
    fn bits(self) -> u64 {
        u64::from(self.to_bits())
    }
}

impl<'a> Input<'a> {
    /// The input of one fuzz run.
    pub fn new(data: &'a [u8]) -> Self {
        Self { data }
    }

    /// Whether every byte has been read.
    pub fn is_empty(&self) -> bool {
        self.data.is_empty()
    }

    /// The next byte (0 when exhausted).
    pub fn byte(&mut self) -> u8 {
        match self.data.split_first() {
            Some((&b, rest)) => {
                self.data = rest;
                b
            }
            None => 0,
        }
    }

    fn array<const N: usize>(&mut self) -> [u8; N] {
        let mut out = [0u8; N];
        for b in &mut out {
            *b = self.byte();
        }
        out
    }

    /// The next 2 bytes, little-endian.
    pub fn u16(&mut self) -> u16 {
        u16::from_le_bytes(self.array())
    }

    /// The next 4 bytes, little-endian.
    pub fn u32(&mut self) -> u32 {
        u32::from_le_bytes(self.array())
    }

    /// The next 8 bytes, little-endian.
    pub fn u64(&mut self) -> u64 {
        u64::from_le_bytes(self.array())
    }

    /// A number of type `T`: raw bits (mode byte ≡ 0 mod 4), an edge value (≡ 1), or
    /// ±10^e with e uniform in [lo, hi] (≡ 2 positive, ≡ 3 negative with a small chance).
    pub fn real<T: Float>(&mut self, lo: f64, hi: f64) -> T {
        let mode = self.byte();
        match mode % 4 {
            0 => T::raw(self),
            1 => {
                let i = usize::from(mode / 4) % EDGES.len();
                T::c(EDGES.get(i).copied().unwrap_or(0.0))
            }
            m => {
                let f = f64::from(self.u16()) / 65535.0;
                let v = 10f64.powf(lo + (hi - lo) * f);
                // the negative side only for 1 in 8 of the mode-3 reads
                if m == 3 && (mode / 4).is_multiple_of(8) {
                    T::c(-v)
                } else {
                    T::c(v)
                }
            }
        }
    }

    /// A length in [0, max].
    pub fn len(&mut self, max: usize) -> usize {
        usize::from(self.u16()) % (max + 1)
    }
}

/// Relative difference |a − b|/|b| in `f64` (0 when both are 0).
pub fn rel(a: f64, b: f64) -> f64 {
    if a == b { 0.0 } else { ((a - b) / b).abs() }
}

/// Whether `x` is a normal number of type `T` (not 0, not subnormal, finite).
pub fn normal<T: Float>(x: T) -> bool {
    x.is_normal()
}

/// A read with its sign flipped when the next byte is odd.
pub fn signed<T: Float>(input: &mut Input<'_>, lo: f64, hi: f64) -> T {
    let v = input.real::<T>(lo, hi);
    if input.byte() % 2 == 1 { -v } else { v }
}

/// Universe parameters: each read in a decade range around common values (or raw bits, or an
/// edge value); for half of the inputs, the defaults with Ω_b = 0.0493 and only the parameters a
/// mask names taken from those reads.
pub fn parameters<T: Float>(input: &mut Input<'_>) -> UniverseParameters<T> {
    let mut p = raw_parameters::<T>(input);
    // half of the runs start from the defaults and change a few parameters only
    if input.byte().is_multiple_of(2) {
        let mut base = UniverseParameters::new(T::c(67.36), T::c(0.3153));
        base.omega_baryon = T::c(0.0493);
        let mask = input.u16();
        let fields: [&mut T; 10] = [
            &mut base.h0_km_s_mpc,
            &mut base.omega_matter,
            &mut base.omega_baryon,
            &mut base.omega_curvature,
            &mut base.cmb_temperature_k,
            &mut base.n_eff,
            &mut base.neutrino_masses_ev[0],
            &mut base.w0,
            &mut base.wa,
            &mut base.helium_mass_fraction,
        ];
        let values = [
            p.h0_km_s_mpc,
            p.omega_matter,
            p.omega_baryon,
            p.omega_curvature,
            p.cmb_temperature_k,
            p.n_eff,
            p.neutrino_masses_ev[0],
            p.w0,
            p.wa,
            p.helium_mass_fraction,
        ];
        for (i, (f, v)) in fields.into_iter().zip(values).enumerate() {
            if mask & (1 << i) != 0 {
                *f = v;
            }
        }
        p = base;
    }
    p
}

fn raw_parameters<T: Float>(input: &mut Input<'_>) -> UniverseParameters<T> {
    let omega_matter = input.real::<T>(-2.0, 0.5);
    let fraction = input.real::<T>(-3.0, 0.0);
    let omega_baryon = if input.byte().is_multiple_of(4) {
        fraction
    } else {
        fraction * omega_matter
    };
    UniverseParameters {
        h0_km_s_mpc: input.real(1.0, 2.3),
        omega_matter,
        omega_baryon,
        omega_curvature: signed(input, -4.0, 0.0),
        cmb_temperature_k: input.real(-1.0, 1.0),
        n_eff: input.real(-1.0, 1.0),
        neutrino_masses_ev: [
            input.real(-4.0, 0.0),
            input.real(-4.0, 0.0),
            input.real(-4.0, 0.0),
        ],
        w0: signed(input, -1.0, 0.5),
        wa: signed(input, -3.0, 0.5),
        helium_mass_fraction: input.real(-2.0, -0.2),
    }
}
