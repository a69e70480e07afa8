//! Numerical kernels shared by every topic. No physics lives here.
//!
//! * [`dd`]: error-free transformations and double-length ("double-double") arithmetic, used
//!   where a rounding of an intermediate would be amplified (the exponent x = hc/λkT of the
//!   Planck function, whose condition number is x).
//! * [`exp`]: Tang's table-driven e^x and e^x − 1 of a double-length argument (pure Rust,
//!   deterministic), the exponential of the Planck kernel.
//! * [`roots`]: the one root finder, a safeguarded (bracketed) Newton iteration.
//! * [`quadrature`]: the one quadrature, adaptive Gauss-Kronrod 7-15 on a fixed-capacity stack.

pub mod dd;
pub mod exp;
pub mod quadrature;
pub mod roots;
