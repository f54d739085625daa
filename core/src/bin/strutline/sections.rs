//! PLACEHOLDER for the `sections` subcommand until its module lands.

/// Runs the subcommand.
pub fn run(_args: &[String]) -> Result<i32, String> {
    Err("the sections command is not available in this build yet".into())
}
