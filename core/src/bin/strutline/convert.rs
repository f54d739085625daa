//! PLACEHOLDER for the `convert` subcommand until its module lands.

/// Runs the subcommand.
pub fn run(_args: &[String]) -> Result<i32, String> {
    Err("the convert command is not available in this build yet".into())
}

/// Reads a member file from text (JSON only until CSV support lands).
pub fn read_any(path: &str, text: &str) -> Result<strutline_core::file::MemberFile, String> {
    strutline_core::file::parse(text).map_err(|e| format!("{path}: {e}"))
}
