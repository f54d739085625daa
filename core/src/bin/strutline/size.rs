//! PLACEHOLDER for the `size` subcommand until its module lands.

/// Runs the subcommand.
pub fn run(_args: &[String]) -> Result<i32, String> {
    Err("the size command is not available in this build yet".into())
}
