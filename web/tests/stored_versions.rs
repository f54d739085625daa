//! Every earlier version of the browser's stored workspace still loads: one
//! fixture per storage version under `tests/fixtures/stored/`. A new storage
//! version adds its predecessor's fixture here, never removes one.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use strutline_core::file;
use strutline_web::workspace;

#[test]
fn workspace_version_1_fixture_loads() {
    let text = include_str!("../../tests/fixtures/stored/workspace-v1.json");
    let ws = workspace::decode(text).unwrap();
    assert_eq!(ws.revision, 7);
    assert_eq!(ws.active, 1);
    assert_eq!(ws.lists.len(), 2);
    assert_eq!(ws.lists[0].members.len(), 11);
    assert_eq!(ws.lists[1].members[0].id, "F-R");
    // Encoded again, it decodes to the same workspace.
    assert_eq!(workspace::decode(&workspace::encode(&ws)).unwrap(), ws);
}

#[test]
fn stored_member_file_version_1_lists_lift_to_the_current_version() {
    // The workspace fixture stores its lists as member-file version 1;
    // member file version 2 (angle_connection) reads them unchanged.
    let text = include_str!("../../tests/fixtures/stored/workspace-v1.json");
    assert!(text.contains("\"format\": \"strutline.members\",\n   \"version\": 1,"));
    let ws = workspace::decode(text).unwrap();
    for list in &ws.lists {
        assert_eq!(list.version, file::VERSION);
        assert!(list.members.iter().all(|m| m.angle_connection.is_none()));
    }
    // Saved again, the lists are written in the current version.
    let again = workspace::encode(&ws);
    let lifted = format!(
        "\"format\": \"strutline.members\",\n  \"version\": {}",
        file::VERSION
    );
    assert_eq!(again.matches(&lifted).count(), ws.lists.len(), "{again}");
}

#[test]
fn a_future_storage_version_is_refused_with_words() {
    let text = include_str!("../../tests/fixtures/stored/workspace-v1.json").replacen(
        "\"version\": 1,\n \"active\"",
        "\"version\": 99,\n \"active\"",
        1,
    );
    assert!(text.contains("\"version\": 99"), "fixture layout changed");
    let e = workspace::decode(&text).unwrap_err();
    assert!(e.contains("version 99"), "{e}");
}
