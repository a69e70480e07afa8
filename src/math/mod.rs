//! Numerical kernels shared by every topic. No physics lives here.
//!
//! * [`dd`]: error-free transformations and double-length ("double-double") arithmetic, used
//!   where a rounding of an intermediate would be amplified (the exponent x = hc/λkT of the
//!   Planck function, whose condition number is x).
//! * [`exp`]: Tang's table-driven e^x and e^x − 1 of a double-length argument (pure Rust,
//!   deterministic), the exponential of the Planck kernel.
//! * [`log`]: ln x and ln(1 + x), table-free and branch-free in their common case (vectorised
//!   in the array functions), within 1 ulp.
//! * [`trig`]: sin x and cos x together, branch-free in their common case (|x| ≤ 1e6), for the
//!   array functions of the transfer function and the top-hat window.
//! * [`roots`]: the one root finder, a safeguarded (bracketed) Newton iteration.
//! * [`ode`]: the one stiff ODE stepper, the Rosenbrock 4(3) method of Kaps & Rentrop with
//!   Shampine's parameters, fixed-size state, no heap (the recombination history).
//! * [`quadrature`]: the one quadrature, adaptive Gauss-Kronrod 7-15 on a fixed-capacity stack.

pub mod dd;
pub mod exp;
pub mod log;
pub mod ode;
pub mod quadrature;
pub mod roots;
pub mod trig;
