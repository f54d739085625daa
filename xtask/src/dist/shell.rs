//! The app's shell: the page, the boot script, the style sheet, the
//! manifest and the service worker, whose cache name is stamped from the
//! files it precaches.

use std::path::Path;

use anyhow::{bail, Context, Result};
use sha2::{Digest, Sha256};

use crate::util;

/// Lines of `web/static/sw.js` that the build replaces.
const SW_CACHE_LINE: &str = "const CACHE_NAME = \"strutline-dev\";";
const SW_FILES_LINE: &str = "const PRECACHE = [];";

/// Copies `from` to `to`, naming both on failure.
pub fn copy(from: &Path, to: &Path) -> Result<()> {
    std::fs::copy(from, to)
        .with_context(|| format!("copying {} to {}", from.display(), to.display()))?;
    Ok(())
}

/// Writes index.html (with [`preload`] links to the JS glue and the wasm
/// module, both files already in `dist`), the manifest and the tidied
/// style sheet of the workspace at `root` into `dist` (boot.js is copied
/// earlier, to be minified with the glue).
pub fn write(root: &Path, dist: &Path, glue: &str, wasm: &str) -> Result<()> {
    for name in [glue, wasm] {
        if !dist.join(name).is_file() {
            bail!(
                "index.html would preload {name}, which is not in {}",
                dist.display()
            );
        }
    }
    let page = root.join("index.html");
    let html =
        std::fs::read_to_string(&page).with_context(|| format!("reading {}", page.display()))?;
    std::fs::write(
        dist.join("index.html"),
        preload(&html, glue, wasm).with_context(|| format!("in {}", page.display()))?,
    )?;
    copy(
        &root.join("web/static/manifest.webmanifest"),
        &dist.join("manifest.webmanifest"),
    )?;
    let style = root.join("web/style.css");
    let css =
        std::fs::read_to_string(&style).with_context(|| format!("reading {}", style.display()))?;
    std::fs::write(dist.join("style.css"), tidy_css(&css))?;
    Ok(())
}

/// The page with links that fetch the JS glue and the wasm module while
/// the page is parsed, before the first `<link` of its head. Without them
/// the module's download waits for boot.js and then the glue to arrive
/// and run (two round trips more, about 0.4 s on the slow connection of
/// `cargo xtask bench-web`). The module is preloaded `as="fetch"` with
/// `crossorigin` (CORS mode, same-origin credentials), the mode of the
/// glue's own `fetch()`, so the browser hands that fetch the preloaded
/// response instead of downloading the module twice.
pub fn preload(html: &str, glue: &str, wasm: &str) -> Result<String> {
    let Some(at) = html
        .find("<link")
        .filter(|&i| html.find("</head>").is_some_and(|h| i < h))
    else {
        bail!("the page has no <link in its head to put the preload links before");
    };
    let indent: String = html
        .get(..at)
        .unwrap_or_default()
        .chars()
        .rev()
        .take_while(|c| *c == ' ')
        .collect();
    let links = format!(
        "<link rel=\"preload\" href=\"{wasm}\" as=\"fetch\" type=\"application/wasm\" crossorigin>\n\
         {indent}<link rel=\"modulepreload\" href=\"{glue}\">\n{indent}"
    );
    let mut out = html.to_string();
    out.insert_str(at, &links);
    Ok(out)
}

/// Writes `dist/sw.js` from `web/static/sw.js`: every other file of `dist`
/// is precached and hashed into the cache name, which is returned.
pub fn write_worker(root: &Path, dist: &Path) -> Result<String> {
    let shipped = util::files_under(dist)?;
    let mut hasher = Sha256::new();
    for rel in &shipped {
        let bytes = std::fs::read(dist.join(rel))?;
        hasher.update(rel.as_bytes());
        hasher.update([0u8]);
        hasher.update((bytes.len() as u64).to_le_bytes());
        hasher.update(&bytes);
    }
    let digest = hasher.finalize();
    let hex: String = digest.iter().take(6).map(|b| format!("{b:02x}")).collect();
    let cache_name = format!("strutline-{hex}");
    let sw = service_worker(&root.join("web/static/sw.js"), &cache_name, &shipped)?;
    // sw.js stays as written: it is small, and its stamped cache name is
    // read back by the update test and by people looking at a deployment.
    std::fs::write(dist.join("sw.js"), sw)?;
    Ok(cache_name)
}

/// The style sheet without its comments and the white space CSS does not
/// need (the rules themselves are left as written).
pub fn tidy_css(css: &str) -> String {
    let mut out = String::with_capacity(css.len());
    let mut rest = css;
    while let Some(i) = rest.find("/*") {
        out.push_str(rest.get(..i).unwrap_or_default());
        rest = match rest.get(i + 2..).and_then(|r| r.find("*/").map(|j| (r, j))) {
            Some((r, j)) => r.get(j + 2..).unwrap_or_default(),
            None => "",
        };
    }
    out.push_str(rest);
    // Runs of white space become one space, and none is kept next to
    // `{`, `}`, `;` or `,` (where CSS never needs it; `:` is left alone, as
    // a space before it can be a descendant combinator).
    let mut tidy = String::with_capacity(out.len());
    for word in out.split_whitespace() {
        let glued = tidy.ends_with(['{', '}', ';', ',']) || word.starts_with(['{', '}', ';', ',']);
        if !tidy.is_empty() && !glued {
            tidy.push(' ');
        }
        tidy.push_str(word);
    }
    tidy
}

/// Fills the worker template with the cache name and the precache list.
fn service_worker(template: &Path, cache_name: &str, shipped: &[String]) -> Result<String> {
    let text = std::fs::read_to_string(template)
        .with_context(|| format!("reading {}", template.display()))?;
    if !text.contains(SW_CACHE_LINE) || !text.contains(SW_FILES_LINE) {
        bail!(
            "{} must contain the lines `{SW_CACHE_LINE}` and `{SW_FILES_LINE}`",
            template.display()
        );
    }
    let mut list = String::from("const PRECACHE = [\n  \"./\",\n");
    for rel in shipped {
        list.push_str(&format!("  \"./{}\",\n", js_escape(rel)));
    }
    list.push_str("];");
    // Whole-line comments are for the source, not the browser.
    let text: String = text
        .lines()
        .filter(|l| !l.trim_start().starts_with("//"))
        .flat_map(|l| [l, "\n"])
        .collect();
    Ok(text
        .replace(
            SW_CACHE_LINE,
            &format!("const CACHE_NAME = \"{cache_name}\";"),
        )
        .replace(SW_FILES_LINE, &list))
}

fn js_escape(s: &str) -> String {
    s.replace('\\', "\\\\").replace('"', "\\\"")
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn css_loses_comments_and_needless_space_only() {
        let css =
            "/* a */\n.x {\n  color: red; /* b\n c */\n}\n\n@media print {\n  .y { a: b; }\n}\n";
        assert_eq!(tidy_css(css), ".x{color: red;}@media print{.y{a: b;}}");
        assert_eq!(tidy_css("a { b: c; } /* open"), "a{b: c;}");
        assert_eq!(
            tidy_css("a :hover, b > c { d: rgba(0, 0, 0) }"),
            "a :hover,b > c{d: rgba(0,0,0)}"
        );
    }

    #[test]
    fn page_preloads_glue_and_module_before_its_first_link() {
        let html = "<html>\n<head>\n  <title>t</title>\n  <link rel=\"manifest\" href=\"m\">\n</head>\n<body><link></body>";
        let out = preload(html, "g.js", "m.wasm").unwrap();
        assert_eq!(
            out,
            "<html>\n<head>\n  <title>t</title>\n  \
             <link rel=\"preload\" href=\"m.wasm\" as=\"fetch\" type=\"application/wasm\" crossorigin>\n  \
             <link rel=\"modulepreload\" href=\"g.js\">\n  \
             <link rel=\"manifest\" href=\"m\">\n</head>\n<body><link></body>"
        );
        assert!(preload("<head></head><body><link></body>", "g.js", "m.wasm").is_err());
        assert!(preload("<head><title>t</title>", "g.js", "m.wasm").is_err());
    }

    #[test]
    fn the_shipped_page_gets_its_preloads() {
        let root = crate::util::root();
        let html = std::fs::read_to_string(root.join("index.html")).unwrap();
        let out = preload(&html, "strutline_web.js", "strutline_web_bg.wasm").unwrap();
        let head = out.split("</head>").next().unwrap();
        let first_link = head.find("<link").unwrap();
        assert_eq!(
            head.get(first_link..)
                .unwrap()
                .find("rel=\"preload\" href=\"strutline_web_bg.wasm\""),
            Some(6)
        );
        assert!(head.contains("<link rel=\"modulepreload\" href=\"strutline_web.js\">"));
    }

    #[test]
    fn worker_template_gets_name_and_files() {
        let dir = std::env::temp_dir().join(format!("xtask-sw-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let t = dir.join("sw.js");
        std::fs::write(&t, format!("{SW_CACHE_LINE}\n{SW_FILES_LINE}\n")).unwrap();
        let out = service_worker(&t, "strutline-abc", &["a.js".into(), "b/c.wasm".into()]).unwrap();
        assert!(out.contains("const CACHE_NAME = \"strutline-abc\";"));
        assert!(
            out.contains("\"./\",")
                && out.contains("\"./a.js\",")
                && out.contains("\"./b/c.wasm\",")
        );
        std::fs::write(&t, "nothing").unwrap();
        assert!(service_worker(&t, "x", &[]).is_err());
        std::fs::remove_dir_all(&dir).unwrap();
    }
}
