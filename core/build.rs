//! Build script: copies the catalogue's data files (`data/*.csv`) into
//! `OUT_DIR`, where `catalogue.rs` embeds them. For the wasm32 target the
//! comment lines (`#`, the source notes) are left out: the browser never
//! shows them and they would cost about 2.7 KB of the app's gzipped size
//! budget; every native build (the command line, the tests) keeps the files
//! whole. Reads and writes files at build time only; the library itself
//! still does no IO.

use std::path::Path;

fn main() -> Result<(), Box<dyn std::error::Error>> {
    let out = std::env::var("OUT_DIR")?;
    let slim = std::env::var("CARGO_CFG_TARGET_ARCH").as_deref() == Ok("wasm32");
    println!("cargo:rerun-if-changed=data");
    for entry in std::fs::read_dir("data")? {
        let path = entry?.path();
        if path.extension().and_then(|e| e.to_str()) != Some("csv") {
            continue;
        }
        println!("cargo:rerun-if-changed={}", path.display());
        let text = std::fs::read_to_string(&path)?;
        let kept = if slim {
            text.lines()
                .filter(|l| !l.trim_start().starts_with('#'))
                .fold(String::with_capacity(text.len()), |mut s, l| {
                    s.push_str(l);
                    s.push('\n');
                    s
                })
        } else {
            text
        };
        let name = path.file_name().ok_or("a data file without a name")?;
        std::fs::write(Path::new(&out).join(name), kept)?;
    }
    Ok(())
}
