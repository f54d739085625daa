pub mod dense;
