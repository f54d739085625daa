//! The member file: reading (with version migration) and writing.
