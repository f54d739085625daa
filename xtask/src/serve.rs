//! `cargo xtask serve [--port N]`: builds `dist/` and serves it on
//! 127.0.0.1 with a small std-only HTTP/1.1 server.
//!
//! One thread per connection (at most [`MAX_CONNECTIONS`] at once), GET
//! and HEAD only, one request per connection, `Cache-Control: no-cache`
//! on every answer. A request path is percent-decoded and resolved inside
//! the served directory; anything that would leave it is refused. A bad
//! request gets a 4xx answer; nothing in here panics.

use std::io::{BufRead, BufReader, Read, Write};
use std::net::{SocketAddr, TcpListener, TcpStream};
use std::path::{Component, Path, PathBuf};
use std::sync::atomic::{AtomicBool, AtomicUsize, Ordering};
use std::sync::Arc;
use std::thread::JoinHandle;
use std::time::Duration;

use anyhow::{Context, Result};

use crate::{dist, util};

/// Connections served at once; more get a 503.
pub const MAX_CONNECTIONS: usize = 64;

/// The longest request head read, bytes.
const MAX_HEAD: usize = 16 * 1024;

/// `cargo xtask serve [--port N] [--no-wasm-opt]`.
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &["--port"], &["--no-wasm-opt"])?;
    let port: u16 = match util::flag_value(args, "--port")? {
        Some(p) => p
            .parse()
            .with_context(|| format!("--port: {p:?} is not a port number"))?,
        None => 8080,
    };
    let built = dist::build(!args.iter().any(|a| a == "--no-wasm-opt"))?;
    dist::report(&built);
    if let Err(e) = dist::check_budget(&built) {
        eprintln!("xtask: WARNING: {e:#} (serving anyway; `cargo xtask dist` fails on it)");
    }
    let server = Server::start(&built.dir, port)?;
    println!("Strutline is at http://127.0.0.1:{}/", server.port());
    println!("(Ctrl-C stops the server)");
    server.wait();
    Ok(())
}

/// A running server.
pub struct Server {
    addr: SocketAddr,
    stop: Arc<AtomicBool>,
    thread: Option<JoinHandle<()>>,
}

impl Server {
    /// Serves `dir` on 127.0.0.1:`port` (0 picks a free port) from a
    /// background thread.
    pub fn start(dir: &Path, port: u16) -> Result<Server> {
        let root = dir
            .canonicalize()
            .with_context(|| format!("serving {}", dir.display()))?;
        let listener = TcpListener::bind(("127.0.0.1", port))
            .with_context(|| format!("binding 127.0.0.1:{port}"))?;
        let addr = listener.local_addr()?;
        let stop = Arc::new(AtomicBool::new(false));
        let flag = Arc::clone(&stop);
        let thread = std::thread::Builder::new()
            .name("xtask-serve".into())
            .spawn(move || accept_loop(&listener, &root, &flag))?;
        Ok(Server {
            addr,
            stop,
            thread: Some(thread),
        })
    }

    /// The port the server listens on.
    pub fn port(&self) -> u16 {
        self.addr.port()
    }

    /// Blocks until the server stops (for `serve`: until the process ends).
    pub fn wait(mut self) {
        if let Some(t) = self.thread.take() {
            let _ = t.join();
        }
    }

    /// Stops accepting connections and waits for the accept loop to end.
    pub fn stop(mut self) {
        self.shutdown();
    }

    fn shutdown(&mut self) {
        self.stop.store(true, Ordering::SeqCst);
        // Wake the blocking accept with one connection of our own.
        let _ = TcpStream::connect_timeout(&self.addr, Duration::from_secs(1));
        if let Some(t) = self.thread.take() {
            let _ = t.join();
        }
    }
}

impl Drop for Server {
    fn drop(&mut self) {
        if self.thread.is_some() {
            self.shutdown();
        }
    }
}

fn accept_loop(listener: &TcpListener, root: &Path, stop: &AtomicBool) {
    let active = Arc::new(AtomicUsize::new(0));
    for conn in listener.incoming() {
        if stop.load(Ordering::SeqCst) {
            break;
        }
        let Ok(stream) = conn else { continue };
        if active.fetch_add(1, Ordering::SeqCst) >= MAX_CONNECTIONS {
            active.fetch_sub(1, Ordering::SeqCst);
            let mut s = stream;
            let _ = respond(&mut s, 503, "text/plain; charset=utf-8", b"busy\n", false);
            continue;
        }
        let root = root.to_path_buf();
        let counter = Arc::clone(&active);
        let spawned = std::thread::Builder::new()
            .name("xtask-conn".into())
            .spawn(move || {
                handle(stream, &root);
                counter.fetch_sub(1, Ordering::SeqCst);
            });
        if spawned.is_err() {
            active.fetch_sub(1, Ordering::SeqCst);
        }
    }
}

/// The request line's method and target, or None for a malformed head.
fn read_head(stream: &TcpStream) -> Option<(String, String, bool)> {
    let mut reader = BufReader::new(stream.take(MAX_HEAD as u64));
    let mut first = String::new();
    reader.read_line(&mut first).ok()?;
    // Drain the header lines up to the blank line (bodies are not read:
    // only GET and HEAD are served).
    let mut line = String::new();
    let mut gzip = false;
    loop {
        line.clear();
        match reader.read_line(&mut line) {
            Ok(0) => return None,
            Ok(_) if line == "\r\n" || line == "\n" => break,
            Ok(_) => gzip |= accepts_gzip(&line),
            Err(_) => return None,
        }
    }
    let mut parts = first.split_whitespace();
    let method = parts.next()?.to_string();
    let target = parts.next()?.to_string();
    let version = parts.next()?;
    if !version.starts_with("HTTP/1.") || parts.next().is_some() {
        return None;
    }
    Some((method, target, gzip))
}

/// Whether a header line is an Accept-Encoding that takes gzip (listed,
/// and not with `q=0`).
fn accepts_gzip(line: &str) -> bool {
    let Some((name, value)) = line.split_once(':') else {
        return false;
    };
    name.trim().eq_ignore_ascii_case("accept-encoding")
        && value.split(',').any(|coding| {
            let mut parts = coding.split(';').map(str::trim);
            let is_gzip = parts.next().is_some_and(|c| c.eq_ignore_ascii_case("gzip"));
            let q = parts
                .find_map(|p| p.strip_prefix("q="))
                .map_or(Some(1.0), |q| q.trim().parse::<f64>().ok());
            is_gzip && q.is_some_and(|q| q > 0.0)
        })
}

fn handle(mut stream: TcpStream, root: &Path) {
    let _ = stream.set_read_timeout(Some(Duration::from_secs(10)));
    let _ = stream.set_write_timeout(Some(Duration::from_secs(10)));
    let Some((method, target, gzip)) = read_head(&stream) else {
        let _ = respond(&mut stream, 400, TEXT, b"bad request\n", false);
        return;
    };
    let head_only = method == "HEAD";
    if method != "GET" && !head_only {
        let _ = respond(&mut stream, 405, TEXT, b"only GET and HEAD\n", false);
        return;
    }
    let Some(path) = resolve(root, &target) else {
        let _ = respond(&mut stream, 400, TEXT, b"bad path\n", head_only);
        return;
    };
    // The file's precompressed `.gz` beside it (written by `cargo xtask
    // dist`) is sent when the client takes gzip.
    let mut packed = path.clone().into_os_string();
    packed.push(".gz");
    let packed = PathBuf::from(packed);
    if gzip && path.is_file() && packed.is_file() {
        if let Ok(bytes) = std::fs::read(&packed) {
            let _ = respond_with(&mut stream, 200, mime(&path), &bytes, head_only, true);
            return;
        }
    }
    match std::fs::read(&path) {
        Ok(bytes) => {
            let _ = respond(&mut stream, 200, mime(&path), &bytes, head_only);
        }
        Err(_) => {
            let _ = respond(&mut stream, 404, TEXT, b"not found\n", head_only);
        }
    }
}

const TEXT: &str = "text/plain; charset=utf-8";

/// Maps a request target to a file under `root`, or None when the target
/// is malformed or would leave `root`.
pub fn resolve(root: &Path, target: &str) -> Option<PathBuf> {
    let path = target.split(['?', '#']).next().unwrap_or("");
    if !path.starts_with('/') {
        return None;
    }
    let decoded = percent_decode(path)?;
    if decoded.contains('\0') || decoded.contains('\\') {
        return None;
    }
    let mut out = root.to_path_buf();
    for part in decoded.split('/') {
        match part {
            "" | "." => {}
            ".." => return None,
            p => {
                // A segment must be one plain name (no drive or root parts).
                let mut comps = Path::new(p).components();
                match (comps.next(), comps.next()) {
                    (Some(Component::Normal(_)), None) => out.push(p),
                    _ => return None,
                }
            }
        }
    }
    if decoded.ends_with('/') || out.is_dir() {
        out.push("index.html");
    }
    // Refuse anything a symlink would take outside the root.
    if let Ok(real) = out.canonicalize() {
        if !real.starts_with(root) {
            return None;
        }
    }
    Some(out)
}

fn percent_decode(s: &str) -> Option<String> {
    let bytes = s.as_bytes();
    let mut out = Vec::with_capacity(bytes.len());
    let mut i = 0;
    while let Some(&b) = bytes.get(i) {
        if b == b'%' {
            let hi = bytes.get(i + 1).and_then(|c| (*c as char).to_digit(16))?;
            let lo = bytes.get(i + 2).and_then(|c| (*c as char).to_digit(16))?;
            out.push((hi * 16 + lo) as u8);
            i += 3;
        } else {
            out.push(b);
            i += 1;
        }
    }
    String::from_utf8(out).ok()
}

/// The Content-Type for a file by its extension.
pub fn mime(path: &Path) -> &'static str {
    match path.extension().and_then(|e| e.to_str()).unwrap_or("") {
        "html" => "text/html; charset=utf-8",
        "js" | "mjs" => "text/javascript; charset=utf-8",
        "wasm" => "application/wasm",
        "css" => "text/css; charset=utf-8",
        "webmanifest" => "application/manifest+json",
        "json" => "application/json",
        "png" => "image/png",
        "svg" => "image/svg+xml",
        "ico" => "image/x-icon",
        "txt" => TEXT,
        _ => "application/octet-stream",
    }
}

fn reason(status: u16) -> &'static str {
    match status {
        200 => "OK",
        400 => "Bad Request",
        404 => "Not Found",
        405 => "Method Not Allowed",
        503 => "Service Unavailable",
        _ => "Status",
    }
}

fn respond(
    stream: &mut TcpStream,
    status: u16,
    content_type: &str,
    body: &[u8],
    head_only: bool,
) -> std::io::Result<()> {
    respond_with(stream, status, content_type, body, head_only, false)
}

/// [`respond`], saying the body is gzip-encoded when `gzipped`.
fn respond_with(
    stream: &mut TcpStream,
    status: u16,
    content_type: &str,
    body: &[u8],
    head_only: bool,
    gzipped: bool,
) -> std::io::Result<()> {
    let mut head = format!(
        "HTTP/1.1 {status} {}\r\nContent-Type: {content_type}\r\nContent-Length: {}\r\nCache-Control: no-cache\r\nX-Content-Type-Options: nosniff\r\nConnection: close\r\n",
        reason(status),
        body.len()
    );
    if status == 405 {
        head.push_str("Allow: GET, HEAD\r\n");
    }
    if gzipped {
        head.push_str("Content-Encoding: gzip\r\n");
    }
    if status == 200 {
        head.push_str("Vary: Accept-Encoding\r\n");
    }
    head.push_str("\r\n");
    stream.write_all(head.as_bytes())?;
    if !head_only {
        stream.write_all(body)?;
    }
    stream.flush()
}

#[cfg(test)]
mod tests {
    use super::*;

    fn temp_root() -> PathBuf {
        let dir = std::env::temp_dir().join(format!(
            "xtask-serve-{}-{:?}",
            std::process::id(),
            std::thread::current().id()
        ));
        let _ = std::fs::remove_dir_all(&dir);
        std::fs::create_dir_all(dir.join("sub")).unwrap();
        std::fs::write(dir.join("index.html"), "<p>home</p>").unwrap();
        std::fs::write(dir.join("app.wasm"), [0u8, 97, 115, 109]).unwrap();
        std::fs::write(dir.join("sub/a b.js"), "x").unwrap();
        dir.canonicalize().unwrap()
    }

    fn get_bytes(port: u16, raw: &str) -> Vec<u8> {
        let mut s = TcpStream::connect(("127.0.0.1", port)).unwrap();
        s.write_all(raw.as_bytes()).unwrap();
        let _ = s.shutdown(std::net::Shutdown::Write);
        let mut out = Vec::new();
        let _ = s.read_to_end(&mut out);
        out
    }

    fn get(port: u16, raw: &str) -> String {
        String::from_utf8_lossy(&get_bytes(port, raw)).into_owned()
    }

    #[test]
    fn resolves_inside_and_refuses_outside() {
        let root = temp_root();
        assert_eq!(resolve(&root, "/").unwrap(), root.join("index.html"));
        assert_eq!(resolve(&root, "/?x=1").unwrap(), root.join("index.html"));
        assert_eq!(
            resolve(&root, "/sub/a%20b.js").unwrap(),
            root.join("sub/a b.js")
        );
        assert!(resolve(&root, "/../etc/passwd").is_none());
        assert!(resolve(&root, "/%2e%2e/etc/passwd").is_none());
        assert!(resolve(&root, "/sub/..%2f..%2fx").is_none());
        assert!(resolve(&root, "/a%zz").is_none());
        assert!(resolve(&root, "relative").is_none());
        assert!(resolve(&root, "/a%00b").is_none());
        std::fs::remove_dir_all(&root).unwrap();
    }

    #[test]
    fn serves_files_with_types_and_answers_bad_requests() {
        let root = temp_root();
        let server = Server::start(&root, 0).unwrap();
        let port = server.port();

        let home = get(port, "GET / HTTP/1.1\r\nHost: x\r\n\r\n");
        assert!(home.starts_with("HTTP/1.1 200 OK\r\n"), "{home}");
        assert!(home.contains("Content-Type: text/html; charset=utf-8\r\n"));
        assert!(home.contains("Cache-Control: no-cache\r\n"));
        assert!(home.ends_with("<p>home</p>"));

        let wasm = get(port, "GET /app.wasm HTTP/1.1\r\n\r\n");
        assert!(
            wasm.contains("Content-Type: application/wasm\r\n"),
            "{wasm}"
        );
        assert!(wasm.contains("Content-Length: 4\r\n"));

        let js = get(port, "HEAD /sub/a%20b.js HTTP/1.1\r\n\r\n");
        assert!(js.contains("Content-Type: text/javascript"), "{js}");
        assert!(js.ends_with("\r\n\r\n"), "HEAD has no body: {js}");

        assert!(get(port, "GET /missing.css HTTP/1.1\r\n\r\n").starts_with("HTTP/1.1 404"));
        assert!(get(port, "GET /../Cargo.toml HTTP/1.1\r\n\r\n").starts_with("HTTP/1.1 400"));
        assert!(get(port, "POST / HTTP/1.1\r\n\r\n").starts_with("HTTP/1.1 405"));
        assert!(get(port, "garbage\r\n\r\n").starts_with("HTTP/1.1 400"));
        assert!(get(port, "\u{1}\u{2}\u{3}").starts_with("HTTP/1.1 400"));
        // A connection that sends nothing and closes must not hurt the server.
        drop(TcpStream::connect(("127.0.0.1", port)).unwrap());
        assert!(get(port, "GET / HTTP/1.0\r\n\r\n").starts_with("HTTP/1.1 200"));

        server.stop();
        std::fs::remove_dir_all(&root).unwrap();
    }

    #[test]
    fn sends_the_precompressed_file_to_clients_that_take_gzip() {
        let root = temp_root();
        let packed = crate::dist::size::zopfli_gzip(b"\0asm").unwrap();
        std::fs::write(root.join("app.wasm.gz"), &packed).unwrap();
        let server = Server::start(&root, 0).unwrap();
        let port = server.port();
        let ask = |enc: &str| get_bytes(port, &format!("GET /app.wasm HTTP/1.1\r\n{enc}\r\n"));
        let gz = ask("Accept-Encoding: br, gzip, deflate\r\n");
        let head = String::from_utf8_lossy(&gz);
        assert!(head.contains("Content-Encoding: gzip\r\n"), "{head}");
        assert!(
            head.contains("Content-Type: application/wasm\r\n"),
            "{head}"
        );
        assert!(
            head.contains(&format!("Content-Length: {}\r\n", packed.len())),
            "{head}"
        );
        assert!(gz.ends_with(&packed), "the body is the .gz file");
        for refused in [
            "",
            "Accept-Encoding: br\r\n",
            "accept-encoding: gzip;q=0\r\n",
        ] {
            let plain = String::from_utf8(ask(refused)).unwrap();
            assert!(!plain.contains("Content-Encoding"), "{refused:?}: {plain}");
            assert!(plain.ends_with("\r\n\r\n\0asm"), "{refused:?}: {plain}");
        }
        server.stop();
        std::fs::remove_dir_all(&root).unwrap();
    }

    #[test]
    fn reads_accept_encoding() {
        assert!(accepts_gzip("Accept-Encoding: gzip, deflate, br\r\n"));
        assert!(accepts_gzip("accept-encoding:GZIP;q=0.5\r\n"));
        assert!(!accepts_gzip("Accept-Encoding: gzip;q=0\r\n"));
        assert!(!accepts_gzip("Accept-Encoding: br, deflate\r\n"));
        assert!(!accepts_gzip("X-Accept-Encoding: gzip\r\n"));
        assert!(!accepts_gzip("Accept-Encoding: x-gzip\r\n"));
    }

    #[test]
    fn mime_types() {
        assert_eq!(
            mime(Path::new("a.webmanifest")),
            "application/manifest+json"
        );
        assert_eq!(mime(Path::new("a.png")), "image/png");
        assert_eq!(mime(Path::new("a.css")), "text/css; charset=utf-8");
        assert_eq!(mime(Path::new("a")), "application/octet-stream");
    }
}
