//! Building blocks for exact section properties (PLACEHOLDER until the
//! sections work lands).
