//! Names as people type them: the one edit distance and the one
//! letters-and-digits form the grade and catalogue lookups share for their
//! suggestions.

/// Levenshtein distance between two byte strings (the names compared are
/// normalised to ASCII first, so bytes are characters).
pub fn edit_distance(a: &[u8], b: &[u8]) -> usize {
    let mut prev: Vec<usize> = (0..=b.len()).collect();
    let mut cur = vec![0; b.len() + 1];
    for (i, ca) in a.iter().enumerate() {
        if let Some(c0) = cur.first_mut() {
            *c0 = i + 1;
        }
        for (j, cb) in b.iter().enumerate() {
            let sub = prev.get(j).copied().unwrap_or(0) + usize::from(ca != cb);
            let del = prev.get(j + 1).copied().unwrap_or(0) + 1;
            let ins = cur.get(j).copied().unwrap_or(0) + 1;
            if let Some(slot) = cur.get_mut(j + 1) {
                *slot = sub.min(del).min(ins);
            }
        }
        std::mem::swap(&mut prev, &mut cur);
    }
    prev.get(b.len()).copied().unwrap_or(0)
}

/// The ASCII letters and digits of a name, upper case ("s355 j2" ->
/// "S355J2").
pub fn alnum_upper(name: &str) -> String {
    name.chars()
        .filter(|c| c.is_ascii_alphanumeric())
        .map(|c| c.to_ascii_uppercase())
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn edit_distance_is_levenshtein() {
        assert_eq!(edit_distance(b"kitten", b"sitting"), 3);
        assert_eq!(edit_distance(b"", b"abc"), 3);
        assert_eq!(edit_distance(b"abc", b""), 3);
        assert_eq!(edit_distance(b"HE200B", b"HE200B"), 0);
        assert_eq!(edit_distance(b"S355", b"S235"), 2);
    }

    #[test]
    fn alnum_upper_keeps_letters_and_digits() {
        assert_eq!(alnum_upper("s355 j2-h."), "S355J2H");
        assert_eq!(alnum_upper("A500 Grade C"), "A500GRADEC");
    }
}
