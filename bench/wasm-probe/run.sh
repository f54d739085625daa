export CARGO_TARGET_DIR=target
for f in base chart fe dense ; do
  if [ "$f" = base ]; then nice cargo build --release --target wasm32-unknown-unknown -q 2>&1 | grep -E "^error" -A5;
  else nice cargo build --release --target wasm32-unknown-unknown --features $f -q 2>&1 | grep -E "^error" -A5; fi
  w=target/wasm32-unknown-unknown/release/wasmprobe.wasm
  echo "$f: $(stat -c %s $w) B, gzip -9 $(gzip -9 -c $w | wc -c) B"
done
