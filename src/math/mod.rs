//! Numerical kernels shared by every topic. No physics lives here.
//!
//! * [`dd`]: error-free transformations and double-length ("double-double") arithmetic, used
//!   where a rounding of an intermediate would be amplified (the exponent x = hc/λkT of the
//!   Planck function, whose condition number is x).
//! * [`roots`]: the one root finder, a safeguarded (bracketed) Newton iteration.
//! * [`quadrature`]: the one quadrature, adaptive Gauss-Kronrod 7-15 on a fixed-capacity stack.

pub mod dd;
pub mod quadrature;
pub mod roots;
