//! What `dist/` costs the people who load it: each file gzipped beside
//! itself by zopfli (`F.gz`, for a server that sends precompressed files,
//! as `cargo xtask serve` does), and the size budget, counted as a
//! standard host sends the files: gzipped on the fly at zlib's best level.

use std::io::Write;
use std::path::Path;

use anyhow::{bail, Result};

use super::Built;
use crate::util;

/// The size budget: 600 KB, summed over every file of `dist/` as a
/// standard host sends it (gzip at zlib's best level, or the file as it is
/// where that is not smaller). The page is loaded once over the network
/// and then runs offline, so this is what a first visit downloads;
/// `cargo xtask bench-web` measures that visit on a slow mobile connection.
pub const BUDGET_BYTES: usize = 600 * 1024;

/// One shipped file of `dist/` and what it costs.
#[derive(Debug, Clone)]
pub struct Shipped {
    /// Path relative to `dist/`, with `/` separators.
    pub path: String,
    /// Its size.
    pub raw: usize,
    /// As a standard host sends it: gzipped at zlib's best level, or
    /// `raw` where that is not smaller. The budget counts this.
    pub zlib: usize,
    /// As `cargo xtask serve` sends it: its zopfli `.gz` where that is
    /// smaller (and then written beside it), else `raw`.
    pub sent: usize,
}

/// The size of `bytes` gzipped at zlib's best level (9): `flate2` on zlib
/// itself (libz-sys, built from its bundled source), so the count is the
/// one a host compressing with zlib sends, byte for byte.
pub fn gzip_len(bytes: &[u8]) -> Result<usize> {
    let mut enc = flate2::write::GzEncoder::new(Vec::new(), flate2::Compression::best());
    enc.write_all(bytes)?;
    Ok(enc.finish()?.len())
}

/// `bytes` in the gzip format, compressed by zopfli (slow, and some 5%
/// smaller than the best level of zlib; any gzip reader reads it).
pub fn zopfli_gzip(bytes: &[u8]) -> Result<Vec<u8>> {
    let mut out = Vec::new();
    zopfli::compress(
        zopfli::Options::default(),
        zopfli::Format::Gzip,
        bytes,
        &mut out,
    )?;
    Ok(out)
}

/// Writes each file's zopfli `.gz` beside it where that is smaller and
/// returns every shipped file with its sizes, then the totals as a
/// standard host sends them (the budget's) and as `serve` sends them.
pub fn compress(dist: &Path) -> Result<(Vec<Shipped>, usize, usize)> {
    let mut files = Vec::new();
    for path in util::files_under(dist)? {
        let bytes = std::fs::read(dist.join(&path))?;
        let raw = bytes.len();
        let gz = zopfli_gzip(&bytes)?;
        let sent = if gz.len() < raw {
            std::fs::write(dist.join(format!("{path}.gz")), &gz)?;
            gz.len()
        } else {
            raw
        };
        files.push(Shipped {
            path,
            raw,
            zlib: gzip_len(&bytes)?.min(raw),
            sent,
        });
    }
    let zlib = files.iter().map(|f| f.zlib).sum();
    let sent = files.iter().map(|f| f.sent).sum();
    Ok((files, zlib, sent))
}

/// Prints the per-file sizes and the totals.
pub fn report(built: &Built) {
    println!("dist/ ({}):", built.cache_name);
    println!(
        "  {:<32} {:>9}  {:>9}  {:>9}",
        "file", "raw B", "zlib -9 B", "sent B"
    );
    for f in &built.files {
        println!(
            "  {:<32} {:>9}  {:>9}  {:>9}",
            f.path, f.raw, f.zlib, f.sent
        );
    }
    println!(
        "  total as a standard host sends it (gzip, zlib -9): {} B ({:.1} KB) of the {} B ({} KB) budget",
        built.zlib_total,
        built.zlib_total as f64 / 1024.0,
        BUDGET_BYTES,
        BUDGET_BYTES / 1024
    );
    println!(
        "  total as `cargo xtask serve` sends it (the zopfli .gz files): {} B ({:.1} KB)",
        built.sent_total,
        built.sent_total as f64 / 1024.0
    );
}

/// Fails when the total as a standard host sends it is over the budget.
pub fn check_budget(built: &Built) -> Result<()> {
    over_budget(built.zlib_total)
}

fn over_budget(total: usize) -> Result<()> {
    if total > BUDGET_BYTES {
        bail!(
            "dist/ is {total} B gzipped at zlib's best level, over the {BUDGET_BYTES} B budget by {} B",
            total - BUDGET_BYTES
        );
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::io::Read;

    /// Text that compresses, but not to nothing: numbered lines.
    fn sample() -> Vec<u8> {
        (0..4000)
            .map(|i| format!("line {i}: {}\n", i * 7919 % 1000))
            .collect::<String>()
            .into_bytes()
    }

    #[test]
    fn both_gzips_read_back_and_zopfli_is_not_larger() {
        let text = sample();
        let zopfli = zopfli_gzip(&text).unwrap();
        let mut back = Vec::new();
        flate2::read::GzDecoder::new(&zopfli[..])
            .read_to_end(&mut back)
            .unwrap();
        assert_eq!(back, text);
        let zlib = gzip_len(&text).unwrap();
        assert!(zlib < text.len() / 2, "{zlib} of {}", text.len());
        assert!(
            zopfli.len() <= zlib,
            "zopfli {} > zlib {zlib}",
            zopfli.len()
        );
    }

    #[test]
    fn gzip_len_is_zlibs_best_level() {
        // Python 3.11's zlib module on zlib 1.2.13 (Debian 12), an outside
        // implementation of the same level: len(zlib.compressobj(9,
        // zlib.DEFLATED, 31) over the same text) = 12,502 B of 58,450 B.
        let text = sample();
        assert_eq!(text.len(), 58_450);
        assert_eq!(gzip_len(&text).unwrap(), 12_502);
    }

    #[test]
    fn compress_counts_each_file_as_sent_and_writes_gz_only_where_smaller() {
        let dir = std::env::temp_dir().join(format!("xtask-size-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&dir);
        std::fs::create_dir_all(dir.join("sub")).unwrap();
        let text = sample();
        std::fs::write(dir.join("sub/a.js"), &text).unwrap();
        // Bytes gzip cannot shrink (a fixed pseudo-random sequence).
        let mut x = 0x2545_f491_u32;
        let noise: Vec<u8> = (0..3000)
            .map(|_| {
                x ^= x << 13;
                x ^= x >> 17;
                x ^= x << 5;
                x.to_le_bytes()[0]
            })
            .collect();
        std::fs::write(dir.join("b.png"), &noise).unwrap();
        let (files, zlib, sent) = compress(&dir).unwrap();
        let paths: Vec<&str> = files.iter().map(|f| f.path.as_str()).collect();
        assert_eq!(paths, ["b.png", "sub/a.js"]);
        let (png, js) = (&files[0], &files[1]);
        assert_eq!((png.raw, png.zlib, png.sent), (3000, 3000, 3000));
        assert!(!dir.join("b.png.gz").exists());
        assert_eq!(js.zlib, gzip_len(&text).unwrap());
        assert_eq!(
            js.sent,
            std::fs::metadata(dir.join("sub/a.js.gz")).unwrap().len() as usize
        );
        assert_eq!((zlib, sent), (png.zlib + js.zlib, png.sent + js.sent));
        std::fs::remove_dir_all(&dir).unwrap();
    }

    #[test]
    fn the_budget_is_600_kb_and_fails_one_byte_over() {
        assert_eq!(BUDGET_BYTES, 614_400);
        assert!(over_budget(BUDGET_BYTES).is_ok());
        let e = over_budget(BUDGET_BYTES + 1).unwrap_err().to_string();
        assert!(e.contains("over the 614400 B budget by 1 B"), "{e}");
    }
}
