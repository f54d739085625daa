//! The app's icons: a bowed strut between two plates on a slate ground,
//! drawn with 4x4 supersampling and written as PNG by the `png` crate. The
//! ground is full-bleed and the figure stays inside the central circle of
//! radius 0.4, so the same picture serves as a maskable icon.

use std::path::Path;

use anyhow::{Context, Result};

/// The icon sizes shipped (`icon-192.png`, `icon-512.png`).
pub const SIZES: [u32; 2] = [192, 512];

/// Writes every icon of [`SIZES`] into `dist`.
pub fn write(dist: &Path) -> Result<()> {
    for size in SIZES {
        std::fs::write(dist.join(format!("icon-{size}.png")), icon_png(size)?)?;
    }
    Ok(())
}

const GROUND: [f64; 3] = [29.0, 59.0, 79.0];
const STRUT: [f64; 3] = [232.0, 163.0, 61.0];
const AXIS: [f64; 3] = [244.0, 241.0, 234.0];

/// The colour of the figure at unit coordinates (x, y), y downwards.
fn figure(x: f64, y: f64) -> [f64; 3] {
    let (top, bottom) = (0.25, 0.75);
    let plate_half_width = 0.17;
    let plate_thickness = 0.045;
    let on_plate = (x - 0.5).abs() <= plate_half_width
        && ((y >= top - plate_thickness && y <= top)
            || (y >= bottom && y <= bottom + plate_thickness));
    if on_plate {
        return STRUT;
    }
    if y > top && y < bottom {
        let t = (y - top) / (bottom - top);
        let centre = 0.5 + 0.075 * (std::f64::consts::PI * t).sin();
        if (x - centre).abs() <= 0.042 {
            return STRUT;
        }
        // The straight line the strut left: a dashed pale axis.
        let dash = ((y - top) / 0.04).floor() as i64 % 2 == 0;
        if dash && (x - 0.5).abs() <= 0.008 {
            return AXIS;
        }
    }
    GROUND
}

/// RGB pixels of the icon at `size` x `size`.
fn icon_pixels(size: u32) -> Vec<u8> {
    const SS: u32 = 4;
    let n = f64::from(size);
    let mut out = Vec::with_capacity((size * size * 3) as usize);
    for py in 0..size {
        for px in 0..size {
            let mut acc = [0.0f64; 3];
            for sy in 0..SS {
                for sx in 0..SS {
                    let x = (f64::from(px) + (f64::from(sx) + 0.5) / f64::from(SS)) / n;
                    let y = (f64::from(py) + (f64::from(sy) + 0.5) / f64::from(SS)) / n;
                    let c = figure(x, y);
                    for (a, v) in acc.iter_mut().zip(c) {
                        *a += v;
                    }
                }
            }
            for a in acc {
                out.push((a / f64::from(SS * SS)).round().clamp(0.0, 255.0) as u8);
            }
        }
    }
    out
}

/// The icon as PNG bytes. It is drawn in a few flat colours, so it is
/// written indexed with the fewest bits per pixel that hold them (about a
/// third of the size of RGB), and as 8-bit RGB should it ever have more
/// than 256 colours.
pub fn icon_png(size: u32) -> Result<Vec<u8>> {
    let pixels = icon_pixels(size);
    let mut palette: Vec<[u8; 3]> = Vec::new();
    let mut index: Vec<u8> = Vec::with_capacity(pixels.len() / 3);
    for px in pixels.chunks(3) {
        let at = |k: usize| px.get(k).copied().unwrap_or(0);
        let c = [at(0), at(1), at(2)];
        let i = match palette.iter().position(|p| *p == c) {
            Some(i) => i,
            None => {
                palette.push(c);
                palette.len() - 1
            }
        };
        // Past 256 colours the index is not used (the image is RGB).
        index.push(u8::try_from(i).unwrap_or(u8::MAX));
    }
    let mut png = Vec::new();
    let mut encoder = png::Encoder::new(&mut png, size, size);
    encoder.set_deflate_compression(png::DeflateCompression::Level(9));
    encoder.set_filter(png::Filter::NoFilter);
    let data = if palette.len() <= 256 {
        let (depth, bits) = match palette.len() {
            0..=2 => (png::BitDepth::One, 1),
            3..=4 => (png::BitDepth::Two, 2),
            5..=16 => (png::BitDepth::Four, 4),
            _ => (png::BitDepth::Eight, 8),
        };
        encoder.set_color(png::ColorType::Indexed);
        encoder.set_depth(depth);
        encoder.set_palette(palette.concat());
        pack(&index, size as usize, bits)
    } else {
        encoder.set_color(png::ColorType::Rgb);
        encoder.set_depth(png::BitDepth::Eight);
        pixels
    };
    let mut writer = encoder
        .write_header()
        .context("writing the icon's PNG header")?;
    writer
        .write_image_data(&data)
        .context("writing the icon's pixels")?;
    writer.finish().context("finishing the icon's PNG")?;
    Ok(png)
}

/// Palette indices packed `bits` to a byte, most significant first, each
/// row of `width` starting on a byte (as PNG lays out depths below 8).
fn pack(index: &[u8], width: usize, bits: usize) -> Vec<u8> {
    let mut out = Vec::with_capacity(index.len() * bits / 8 + index.len() / width.max(1) + 1);
    for row in index.chunks(width.max(1)) {
        let mut byte = 0u8;
        let mut used = 0;
        for &i in row {
            byte |= i << (8 - bits - used);
            used += bits;
            if used == 8 {
                out.push(byte);
                byte = 0;
                used = 0;
            }
        }
        if used > 0 {
            out.push(byte);
        }
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;

    /// Decodes a PNG with the `png` crate into 8-bit RGB pixels.
    fn decode(bytes: &[u8]) -> (png::OutputInfo, Vec<u8>) {
        let mut decoder = png::Decoder::new(std::io::Cursor::new(bytes));
        decoder.set_transformations(png::Transformations::EXPAND);
        let mut reader = decoder.read_info().unwrap();
        let mut buf = vec![0; reader.output_buffer_size().unwrap()];
        let info = reader.next_frame(&mut buf).unwrap();
        buf.truncate(info.buffer_size());
        (info, buf)
    }

    #[test]
    fn icons_decode_to_the_drawn_pixels() {
        for size in [16, 192] {
            let png = icon_png(size).unwrap();
            let (info, rgb) = decode(&png);
            assert_eq!((info.width, info.height), (size, size));
            assert_eq!(
                info.color_type,
                png::ColorType::Rgb,
                "the palette expands to RGB"
            );
            assert_eq!(rgb, icon_pixels(size), "size {size}");
        }
    }

    #[test]
    fn icon_is_indexed_with_few_bits() {
        let png = icon_png(192).unwrap();
        let decoder = png::Decoder::new(std::io::Cursor::new(&png[..]));
        let reader = decoder.read_info().unwrap();
        let info = reader.info();
        assert_eq!(info.color_type, png::ColorType::Indexed);
        let colours = info.palette.as_ref().unwrap().len() / 3;
        let bits = info.bit_depth as u32;
        assert!(
            colours <= 1 << bits && bits <= 8,
            "{colours} colours at {bits} bits"
        );
        assert!(
            colours > 1 << (bits / 2),
            "{colours} colours fit in fewer than {bits} bits"
        );
    }

    #[test]
    fn indices_pack_most_significant_first_per_row() {
        assert_eq!(
            pack(&[1, 0, 1, 1, 0, 1], 3, 1),
            vec![0b1010_0000, 0b1010_0000]
        );
        assert_eq!(pack(&[3, 2, 1, 0, 3], 5, 2), vec![0b1110_0100, 0b1100_0000]);
        assert_eq!(pack(&[0xa, 0x5, 0xf], 3, 4), vec![0xa5, 0xf0]);
        assert_eq!(pack(&[7, 200], 2, 8), vec![7, 200]);
    }

    #[test]
    fn icon_corners_are_ground_and_centre_is_figure() {
        let px = icon_pixels(64);
        let at = |x: usize, y: usize| &px[(y * 64 + x) * 3..(y * 64 + x) * 3 + 3];
        assert_eq!(at(0, 0), &[29, 59, 79]);
        assert_eq!(at(63, 63), &[29, 59, 79]);
        // Mid-height the strut is bowed right of the centre line.
        let mid = at(37, 32);
        assert_eq!(mid, &[232, 163, 61]);
    }
}
