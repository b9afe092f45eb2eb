;; The loss reader of decimal.ts (`readDecimal`) in WebAssembly, with the same rules and results.
;; Source of src/artifact/generated/decimal-wasm.ts (`node scripts/gen-wasm.mjs`, through wabt).
;;
;; Why: V8 runs JavaScript slowly until its optimizing compiler has compiled it, and on 2 cores the
;; reader, the row loop and their recompiles take 50-100 ms of compiler time; a review of 2 x 1M
;; losses spent about 30 ms of its time reading numbers in code not yet compiled. WebAssembly is
;; compiled before it first runs (in well under a millisecond for this module), and has 64-bit
;; integers, so up to 19 digits are read exactly.
;;
;; Memory (one per predictions file, decimal-wasm.ts): bytes 0-7 the value read, 8-11 where a
;; value that Number() must read ends; 64-831 the tables below (set by $init); the file's bytes
;; from 1024 on. Positions are relative to byte 1024 (the `offset=1024` of every load).
(module
  (import "env" "mem" (memory 1))

  ;; 10^k (k = 0..22, exact) at 64 + 8k, its Veltkamp halves (26 bits each) at 256 + 8k and
  ;; 448 + 8k, and the rounded 1/10^k at 640 + 8k.
  (func $init
    (local $k i32) (local $x f64) (local $t f64) (local $h f64)
    (local.set $x (f64.const 1))
    (loop $each
      (local.set $t (f64.mul (f64.const 134217729) (local.get $x)))
      (local.set $h (f64.sub (local.get $t) (f64.sub (local.get $t) (local.get $x))))
      (f64.store offset=64 (i32.shl (local.get $k) (i32.const 3)) (local.get $x))
      (f64.store offset=256 (i32.shl (local.get $k) (i32.const 3)) (local.get $h))
      (f64.store offset=448 (i32.shl (local.get $k) (i32.const 3)) (f64.sub (local.get $x) (local.get $h)))
      (f64.store offset=640 (i32.shl (local.get $k) (i32.const 3)) (f64.div (f64.const 1) (local.get $x)))
      (local.set $x (f64.mul (local.get $x) (f64.const 10)))
      (local.set $k (i32.add (local.get $k) (i32.const 1)))
      (br_if $each (i32.le_u (local.get $k) (i32.const 22)))))
  (start $init)

  ;; read(p, end): a plain decimal (-?D+(.D+)?([eE][+-]?D+)?) within +-1e15 and a newline, from p
  ;; (before end). Returns the position after the newline with the value at byte 0; -1 for
  ;; anything else (as readDecimal); -2 when the value is near a tie or has more than 19 digits or
  ;; a scale beyond +-22: then Number() must read the text up to the newline, whose position is at
  ;; byte 8.
  (func (export "read") (param $p i32) (param $end i32) (result i32)
    (local $c i32) (local $neg i32) (local $m i64) (local $over i32) (local $start i32)
    (local $scale i32) (local $w i64) (local $e i32) (local $es i32) (local $k i32)
    (local $x f64) (local $d f64) (local $mh f64) (local $ml f64) (local $q0 f64) (local $r f64)
    (local $xh f64) (local $xl f64) (local $t f64) (local $pp f64) (local $delta f64)
    (local $dh f64) (local $dl f64) (local $inv f64)
    (if (i32.ge_u (local.get $p) (local.get $end)) (then (return (i32.const -1))))
    (if (i32.eq (i32.load8_u offset=1024 (local.get $p)) (i32.const 45))
      (then
        (local.set $neg (i32.const 1))
        (local.set $p (i32.add (local.get $p) (i32.const 1)))))
    ;; The digits in m while it stays below 10^18 (then it has at most 19), else $over.
    (local.set $start (local.get $p))
    (block $done
      (loop $digits
        (br_if $done (i32.ge_u (local.get $p) (local.get $end)))
        (local.set $c (i32.load8_u offset=1024 (local.get $p)))
        (br_if $done (i32.ge_u (i32.sub (local.get $c) (i32.const 48)) (i32.const 10)))
        (if (i64.lt_u (local.get $m) (i64.const 1000000000000000000))
          (then
            (local.set $m
              (i64.add (i64.mul (local.get $m) (i64.const 10))
                (i64.extend_i32_u (i32.sub (local.get $c) (i32.const 48))))))
          (else (local.set $over (i32.const 1))))
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (br $digits)))
    (if (i32.eq (local.get $p) (local.get $start)) (then (return (i32.const -1))))
    (if (i32.and (i32.lt_u (local.get $p) (local.get $end)) (i32.eq (local.get $c) (i32.const 46)))
      (then
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (local.set $start (local.get $p))
        ;; Eight digits at a time while m < 10^11 (m * 10^8 + 99999999 < 10^19). The test and the
        ;; conversion are the usual SWAR ones (common practice; the conversion as in simdjson's
        ;; parse_eight_digits_unrolled): the first digit is the lowest byte.
        (block $wide_done
          (loop $wide
            (br_if $wide_done (i32.gt_u (i32.add (local.get $p) (i32.const 8)) (local.get $end)))
            (br_if $wide_done (i64.ge_u (local.get $m) (i64.const 100000000000)))
            (local.set $w (i64.load offset=1024 align=1 (local.get $p)))
            (br_if $wide_done
              (i64.ne (i64.and (local.get $w) (i64.const 0xF0F0F0F0F0F0F0F0))
                (i64.const 0x3030303030303030)))
            (br_if $wide_done
              (i64.ne
                (i64.and (i64.add (local.get $w) (i64.const 0x0606060606060606))
                  (i64.const 0xF0F0F0F0F0F0F0F0))
                (i64.const 0x3030303030303030)))
            (local.set $w
              (i64.shr_u
                (i64.mul (i64.and (local.get $w) (i64.const 0x0F0F0F0F0F0F0F0F)) (i64.const 2561))
                (i64.const 8)))
            (local.set $w
              (i64.shr_u
                (i64.mul (i64.and (local.get $w) (i64.const 0x00FF00FF00FF00FF)) (i64.const 6553601))
                (i64.const 16)))
            (local.set $w
              (i64.shr_u
                (i64.mul (i64.and (local.get $w) (i64.const 0x0000FFFF0000FFFF))
                  (i64.const 42949672960001))
                (i64.const 32)))
            (local.set $m (i64.add (i64.mul (local.get $m) (i64.const 100000000)) (local.get $w)))
            (local.set $p (i32.add (local.get $p) (i32.const 8)))
            (br $wide)))
        (block $fraction_done
          (loop $fraction
            (br_if $fraction_done (i32.ge_u (local.get $p) (local.get $end)))
            (local.set $c (i32.load8_u offset=1024 (local.get $p)))
            (br_if $fraction_done (i32.ge_u (i32.sub (local.get $c) (i32.const 48)) (i32.const 10)))
            (if (i64.lt_u (local.get $m) (i64.const 1000000000000000000))
              (then
                (local.set $m
                  (i64.add (i64.mul (local.get $m) (i64.const 10))
                    (i64.extend_i32_u (i32.sub (local.get $c) (i32.const 48))))))
              (else (local.set $over (i32.const 1))))
            (local.set $p (i32.add (local.get $p) (i32.const 1)))
            (br $fraction)))
        (if (i32.eq (local.get $p) (local.get $start)) (then (return (i32.const -1))))
        (local.set $scale (i32.sub (local.get $start) (local.get $p)))))
    (if (i32.ge_u (local.get $p) (local.get $end)) (then (return (i32.const -1))))
    ;; The exponent ('e' or 'E'), read up to 100000 as readDecimal does.
    (if (i32.eq (i32.or (local.get $c) (i32.const 32)) (i32.const 101))
      (then
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (local.set $es (i32.const 1))
        (if (i32.lt_u (local.get $p) (local.get $end))
          (then
            (local.set $c (i32.load8_u offset=1024 (local.get $p)))
            (if (i32.or (i32.eq (local.get $c) (i32.const 43)) (i32.eq (local.get $c) (i32.const 45)))
              (then
                (if (i32.eq (local.get $c) (i32.const 45)) (then (local.set $es (i32.const -1))))
                (local.set $p (i32.add (local.get $p) (i32.const 1)))))))
        (local.set $start (local.get $p))
        (block $exponent_done
          (loop $exponent
            (br_if $exponent_done (i32.ge_u (local.get $p) (local.get $end)))
            (local.set $c (i32.load8_u offset=1024 (local.get $p)))
            (br_if $exponent_done (i32.ge_u (i32.sub (local.get $c) (i32.const 48)) (i32.const 10)))
            (if (i32.lt_u (local.get $e) (i32.const 100000))
              (then
                (local.set $e
                  (i32.add (i32.mul (local.get $e) (i32.const 10)) (i32.sub (local.get $c) (i32.const 48))))))
            (local.set $p (i32.add (local.get $p) (i32.const 1)))
            (br $exponent)))
        (if (i32.or (i32.eq (local.get $p) (local.get $start)) (i32.ge_u (local.get $p) (local.get $end)))
          (then (return (i32.const -1))))
        (local.set $scale (i32.add (local.get $scale) (i32.mul (local.get $es) (local.get $e))))))
    (if (i32.ne (local.get $c) (i32.const 10)) (then (return (i32.const -1))))
    ;; The value m * 10^scale, as decimal.ts `decodeDecimal` computes it (see its comment).
    (block $ask_number
      (br_if $ask_number (local.get $over))
      (br_if $ask_number (i32.gt_u (i32.add (local.get $scale) (i32.const 22)) (i32.const 44)))
      (local.set $k
        (select (i32.sub (i32.const 0) (local.get $scale)) (local.get $scale)
          (i32.lt_s (local.get $scale) (i32.const 0))))
      (local.set $d (f64.load offset=64 (i32.shl (local.get $k) (i32.const 3))))
      (if (i64.lt_u (local.get $m) (i64.const 9007199254740992))
        (then
          ;; Below 2^53: m is exact as a double, one rounding (Clinger's fast path).
          (local.set $x (f64.convert_i64_u (local.get $m)))
          (local.set $x
            (if (result f64) (i32.lt_s (local.get $scale) (i32.const 0))
              (then (f64.div (local.get $x) (local.get $d)))
              (else (f64.mul (local.get $x) (local.get $d))))))
        (else
          ;; m = mh + ml exactly (mh rounded to a double; |ml| <= 2^10, an exact small integer).
          (local.set $mh (f64.convert_i64_u (local.get $m)))
          (local.set $ml (f64.convert_i64_s (i64.sub (local.get $m) (i64.trunc_f64_u (local.get $mh)))))
          (local.set $dh (f64.load offset=256 (i32.shl (local.get $k) (i32.const 3))))
          (local.set $dl (f64.load offset=448 (i32.shl (local.get $k) (i32.const 3))))
          (if (i32.ge_s (local.get $scale) (i32.const 0))
            (then
              ;; m*d - q0 = (mh*d - q0) + ml*d: the first term exactly (Dekker), the second to 2^-53.
              (local.set $q0 (f64.mul (local.get $mh) (local.get $d)))
              (local.set $t (f64.mul (f64.const 134217729) (local.get $mh)))
              (local.set $xh (f64.sub (local.get $t) (f64.sub (local.get $t) (local.get $mh))))
              (local.set $xl (f64.sub (local.get $mh) (local.get $xh)))
              (local.set $delta
                (f64.add
                  (f64.add
                    (f64.add
                      (f64.add
                        (f64.sub (f64.mul (local.get $xh) (local.get $dh)) (local.get $q0))
                        (f64.mul (local.get $xh) (local.get $dl)))
                      (f64.mul (local.get $xl) (local.get $dh)))
                    (f64.mul (local.get $xl) (local.get $dl)))
                  (f64.mul (local.get $ml) (local.get $d)))))
            (else
              ;; m - q0*d = (mh - pp) - (q0*d - pp) + ml, in units of d, for q0 = mh * (1/d).
              (local.set $inv (f64.load offset=640 (i32.shl (local.get $k) (i32.const 3))))
              (local.set $q0 (f64.mul (local.get $mh) (local.get $inv)))
              (local.set $pp (f64.mul (local.get $q0) (local.get $d)))
              (local.set $t (f64.mul (f64.const 134217729) (local.get $q0)))
              (local.set $xh (f64.sub (local.get $t) (f64.sub (local.get $t) (local.get $q0))))
              (local.set $xl (f64.sub (local.get $q0) (local.get $xh)))
              (local.set $r
                (f64.add
                  (f64.sub
                    (f64.sub (local.get $mh) (local.get $pp))
                    (f64.add
                      (f64.add
                        (f64.add
                          (f64.sub (f64.mul (local.get $xh) (local.get $dh)) (local.get $pp))
                          (f64.mul (local.get $xh) (local.get $dl)))
                        (f64.mul (local.get $xl) (local.get $dh)))
                      (f64.mul (local.get $xl) (local.get $dl))))
                  (local.get $ml)))
              (local.set $delta (f64.mul (local.get $r) (local.get $inv)))))
          ;; q0 + delta rounded once; a near-tie (the rounding changes when delta moves by 2^-20 of
          ;; itself) is left to Number().
          (local.set $x
            (f64.add (local.get $q0) (f64.mul (local.get $delta) (f64.const 1.00000095367431640625))))
          (br_if $ask_number
            (f64.ne (local.get $x)
              (f64.add (local.get $q0) (f64.mul (local.get $delta) (f64.const 0.99999904632568359375)))))))
      (if (local.get $neg) (then (local.set $x (f64.neg (local.get $x)))))
      (if (i32.eqz (f64.le (f64.abs (local.get $x)) (f64.const 1e15))) (then (return (i32.const -1))))
      (f64.store (i32.const 0) (local.get $x))
      (return (i32.add (local.get $p) (i32.const 1))))
    (i32.store (i32.const 8) (local.get $p))
    (i32.const -2)))
