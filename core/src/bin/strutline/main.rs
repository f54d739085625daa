//! The `strutline` command line (being written).
fn main() {}
