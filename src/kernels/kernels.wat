;; Row kernels of the fit in WebAssembly: the streaming Householder QR fold (qr-fold.ts), the
;; refinement pass (refine.ts), the leverages of a full-rank fit (leverages.ts), predictions
;; (products.ts), the weighted Gram (gram.ts), out-of-fold errors (out-of-fold.ts), polynomial columns (polynomial-columns.ts)
;; and the design's range check (range-check.ts). WebAssembly is compiled before its first call
;; and computes with unboxed doubles from the start, where JavaScript would run these loops in
;; V8's interpreter for most of a small model's run. Each function does the operations of its
;; JavaScript reference (the `...Js` function of the module named) in the same order, so the
;; results are the same to the bit (IEEE 754 arithmetic, no fused multiply-add);
;; test/kernels/wasm-kernels.test.ts compares the two.
;;
;; Arrays are float64 in the module's memory, passed as byte addresses; matrices are column-major.
;; Assembled by test/tools/gen-wasm.mjs into src/kernels/generated/kernels-wasm.ts.
(module
  (memory (export "memory") 1)

  ;; Where fold found a value that is NaN or infinite: its row (within the block) and column
  ;; (-1 for y). Read by the caller when fold returns 1.
  (global $badRow (export "badRow") (mut i32) (i32.const 0))
  (global $badColumn (export "badColumn") (mut i32) (i32.const 0))
  ;; The residual sum of squares fold adds to (set by the caller, read after the call).
  (global $rss (export "rss") (mut f64) (f64.const 0))

  ;; Sums of squares in this range are computed without rescaling (qr-fold.ts).
  (global $SAFE_SMALL f64 (f64.const 1e-150))
  (global $SAFE_LARGE f64 (f64.const 1e150))

  ;; Index of the first NaN or infinite value among the n at a, or -1 (refine.ts, firstNotFinite).
  (func $firstNotFinite (export "firstNotFinite") (param $a i32) (param $n i32) (result i32)
    (local $i i32) (local $v f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $v (f64.load (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3)))))
        ;; v - v is 0 for every finite v, NaN for NaN and the infinities.
        (if (f64.ne (f64.sub (local.get $v) (local.get $v)) (f64.const 0)) (then (return (local.get $i))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (i32.const -1))

  ;; Copies n values from src to dst when all are finite; returns the index of the first that is
  ;; not, or -1.
  (func $copyChecked (param $src i32) (param $dst i32) (param $n i32) (result i32)
    (local $bad i32)
    (local.set $bad (call $firstNotFinite (local.get $src) (local.get $n)))
    (if (i32.lt_s (local.get $bad) (i32.const 0))
      (then (memory.copy (local.get $dst) (local.get $src) (i32.shl (local.get $n) (i32.const 3)))))
    (local.get $bad))

  (func $largestMagnitude (param $a i32) (param $n i32) (result f64)
    (local $i i32) (local $amax f64) (local $v f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $v (f64.abs (f64.load (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3))))))
        (if (f64.gt (local.get $v) (local.get $amax)) (then (local.set $amax (local.get $v))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.get $amax))

  (func $sumOfSquares (param $a i32) (param $n i32) (result f64)
    (local $i i32) (local $s f64) (local $c f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $c (f64.load (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3)))))
        (local.set $s (f64.add (local.get $s) (f64.mul (local.get $c) (local.get $c))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.get $s))

  (func $scaledSumOfSquares (param $a i32) (param $n i32) (param $scale f64) (result f64)
    (local $i i32) (local $s f64) (local $c f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $c (f64.div (f64.load (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3)))) (local.get $scale)))
        (local.set $s (f64.add (local.get $s) (f64.mul (local.get $c) (local.get $c))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.get $s))

  (func $divide (param $a i32) (param $n i32) (param $d f64)
    (local $i i32) (local $at i32)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $at (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3))))
        (f64.store (local.get $at) (f64.div (f64.load (local.get $at)) (local.get $d)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next))))

  ;; The reflector of a column (qr-fold.ts, reflector): overwrites the mb values at cj with
  ;; u's lower part and returns beta; NaN (column unchanged) when the block part is zero.
  (func $reflector (param $cj i32) (param $mb i32) (param $alpha f64) (result f64)
    (local $amax f64) (local $sigma f64) (local $scaled f64) (local $a0 f64) (local $norm f64) (local $beta f64)
    (local.set $amax (f64.max (f64.abs (local.get $alpha)) (call $largestMagnitude (local.get $cj) (local.get $mb))))
    (if (f64.eq (local.get $amax) (f64.const 0)) (then (return (f64.const nan))))
    (if (i32.and (f64.gt (local.get $amax) (global.get $SAFE_SMALL)) (f64.lt (local.get $amax) (global.get $SAFE_LARGE)))
      (then
        (local.set $sigma (call $sumOfSquares (local.get $cj) (local.get $mb)))
        (if (f64.eq (local.get $sigma) (f64.const 0)) (then (return (f64.const nan))))
        (local.set $norm (f64.sqrt (f64.add (f64.mul (local.get $alpha) (local.get $alpha)) (local.get $sigma)))))
      (else
        (local.set $scaled (call $scaledSumOfSquares (local.get $cj) (local.get $mb) (local.get $amax)))
        (if (f64.eq (local.get $scaled) (f64.const 0)) (then (return (f64.const nan))))
        (local.set $a0 (f64.div (local.get $alpha) (local.get $amax)))
        (local.set $norm (f64.mul (local.get $amax) (f64.sqrt (f64.add (f64.mul (local.get $a0) (local.get $a0)) (local.get $scaled)))))))
    (local.set $beta (select (f64.neg (local.get $norm)) (local.get $norm) (f64.ge (local.get $alpha) (f64.const 0))))
    (call $divide (local.get $cj) (local.get $mb) (f64.sub (local.get $alpha) (local.get $beta)))
    (local.get $beta))

  ;; Applies the reflector of column j (u at cj) to columns k .. k+3 of [R; C] (reflectFour).
  (func $reflectFour (param $R i32) (param $C i32) (param $ld i32) (param $p i32) (param $j i32) (param $k i32) (param $mb i32) (param $tau f64)
    (local $cj i32) (local $c1 i32) (local $c2 i32) (local $c3 i32) (local $c4 i32) (local $r1 i32) (local $pb i32)
    (local $w1 f64) (local $w2 f64) (local $w3 f64) (local $w4 f64) (local $f1 f64) (local $f2 f64) (local $f3 f64) (local $f4 f64)
    (local $u f64) (local $i i32) (local $off i32) (local $at i32)
    (local.set $cj (i32.add (local.get $C) (i32.shl (i32.mul (local.get $j) (local.get $ld)) (i32.const 3))))
    (local.set $c1 (i32.add (local.get $C) (i32.shl (i32.mul (local.get $k) (local.get $ld)) (i32.const 3))))
    (local.set $c2 (i32.add (local.get $c1) (i32.shl (local.get $ld) (i32.const 3))))
    (local.set $c3 (i32.add (local.get $c2) (i32.shl (local.get $ld) (i32.const 3))))
    (local.set $c4 (i32.add (local.get $c3) (i32.shl (local.get $ld) (i32.const 3))))
    (local.set $r1 (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $k) (local.get $p)) (local.get $j)) (i32.const 3))))
    (local.set $pb (i32.shl (local.get $p) (i32.const 3)))
    (local.set $w1 (f64.load (local.get $r1)))
    (local.set $w2 (f64.load (i32.add (local.get $r1) (local.get $pb))))
    (local.set $w3 (f64.load (i32.add (local.get $r1) (i32.mul (local.get $pb) (i32.const 2)))))
    (local.set $w4 (f64.load (i32.add (local.get $r1) (i32.mul (local.get $pb) (i32.const 3)))))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $u (f64.load (i32.add (local.get $cj) (local.get $off))))
        (local.set $w1 (f64.add (local.get $w1) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c1) (local.get $off))))))
        (local.set $w2 (f64.add (local.get $w2) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c2) (local.get $off))))))
        (local.set $w3 (f64.add (local.get $w3) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c3) (local.get $off))))))
        (local.set $w4 (f64.add (local.get $w4) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c4) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.set $f1 (f64.mul (local.get $tau) (local.get $w1)))
    (local.set $f2 (f64.mul (local.get $tau) (local.get $w2)))
    (local.set $f3 (f64.mul (local.get $tau) (local.get $w3)))
    (local.set $f4 (f64.mul (local.get $tau) (local.get $w4)))
    (if (i32.and (i32.and (f64.eq (local.get $f1) (f64.const 0)) (f64.eq (local.get $f2) (f64.const 0)))
                 (i32.and (f64.eq (local.get $f3) (f64.const 0)) (f64.eq (local.get $f4) (f64.const 0))))
      (then (return)))
    (f64.store (local.get $r1) (f64.sub (f64.load (local.get $r1)) (local.get $f1)))
    (local.set $at (i32.add (local.get $r1) (local.get $pb)))
    (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (local.get $f2)))
    (local.set $at (i32.add (local.get $at) (local.get $pb)))
    (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (local.get $f3)))
    (local.set $at (i32.add (local.get $at) (local.get $pb)))
    (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (local.get $f4)))
    (local.set $i (i32.const 0))
    (block $done2
      (loop $next2
        (br_if $done2 (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $u (f64.load (i32.add (local.get $cj) (local.get $off))))
        (local.set $at (i32.add (local.get $c1) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f1) (local.get $u))))
        (local.set $at (i32.add (local.get $c2) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f2) (local.get $u))))
        (local.set $at (i32.add (local.get $c3) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f3) (local.get $u))))
        (local.set $at (i32.add (local.get $c4) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f4) (local.get $u))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next2))))

  ;; Applies the reflector of column j to columns k and k+1 of [R; C] (reflectTwo).
  (func $reflectTwo (param $R i32) (param $C i32) (param $ld i32) (param $p i32) (param $j i32) (param $k i32) (param $mb i32) (param $tau f64)
    (local $cj i32) (local $c1 i32) (local $c2 i32) (local $r1 i32) (local $r2 i32)
    (local $w1 f64) (local $w2 f64) (local $f1 f64) (local $f2 f64) (local $u f64) (local $i i32) (local $off i32) (local $at i32)
    (local.set $cj (i32.add (local.get $C) (i32.shl (i32.mul (local.get $j) (local.get $ld)) (i32.const 3))))
    (local.set $c1 (i32.add (local.get $C) (i32.shl (i32.mul (local.get $k) (local.get $ld)) (i32.const 3))))
    (local.set $c2 (i32.add (local.get $c1) (i32.shl (local.get $ld) (i32.const 3))))
    (local.set $r1 (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $k) (local.get $p)) (local.get $j)) (i32.const 3))))
    (local.set $r2 (i32.add (local.get $r1) (i32.shl (local.get $p) (i32.const 3))))
    (local.set $w1 (f64.load (local.get $r1)))
    (local.set $w2 (f64.load (local.get $r2)))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $u (f64.load (i32.add (local.get $cj) (local.get $off))))
        (local.set $w1 (f64.add (local.get $w1) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c1) (local.get $off))))))
        (local.set $w2 (f64.add (local.get $w2) (f64.mul (local.get $u) (f64.load (i32.add (local.get $c2) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.set $f1 (f64.mul (local.get $tau) (local.get $w1)))
    (local.set $f2 (f64.mul (local.get $tau) (local.get $w2)))
    (if (i32.and (f64.eq (local.get $f1) (f64.const 0)) (f64.eq (local.get $f2) (f64.const 0))) (then (return)))
    (f64.store (local.get $r1) (f64.sub (f64.load (local.get $r1)) (local.get $f1)))
    (f64.store (local.get $r2) (f64.sub (f64.load (local.get $r2)) (local.get $f2)))
    (local.set $i (i32.const 0))
    (block $done2
      (loop $next2
        (br_if $done2 (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $u (f64.load (i32.add (local.get $cj) (local.get $off))))
        (local.set $at (i32.add (local.get $c1) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f1) (local.get $u))))
        (local.set $at (i32.add (local.get $c2) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f2) (local.get $u))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next2))))

  ;; Applies the reflector of column j to column k of [R; C] (reflectOne).
  (func $reflectOne (param $R i32) (param $C i32) (param $ld i32) (param $p i32) (param $j i32) (param $k i32) (param $mb i32) (param $tau f64)
    (local $cj i32) (local $ck i32) (local $r i32) (local $w f64) (local $f f64) (local $i i32) (local $off i32) (local $at i32)
    (local.set $cj (i32.add (local.get $C) (i32.shl (i32.mul (local.get $j) (local.get $ld)) (i32.const 3))))
    (local.set $ck (i32.add (local.get $C) (i32.shl (i32.mul (local.get $k) (local.get $ld)) (i32.const 3))))
    (local.set $r (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $k) (local.get $p)) (local.get $j)) (i32.const 3))))
    (local.set $w (f64.load (local.get $r)))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $w (f64.add (local.get $w) (f64.mul (f64.load (i32.add (local.get $cj) (local.get $off))) (f64.load (i32.add (local.get $ck) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.set $f (f64.mul (local.get $tau) (local.get $w)))
    (if (f64.eq (local.get $f) (f64.const 0)) (then (return)))
    (f64.store (local.get $r) (f64.sub (f64.load (local.get $r)) (local.get $f)))
    (local.set $i (i32.const 0))
    (block $done2
      (loop $next2
        (br_if $done2 (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $at (i32.add (local.get $ck) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f) (f64.load (i32.add (local.get $cj) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next2))))

  ;; Applies the reflector of column j (u at cj) to the right-hand side [qty; yc] (reflectTarget).
  (func $reflectTarget (param $qty i32) (param $yc i32) (param $cj i32) (param $mb i32) (param $tau f64) (param $j i32)
    (local $q i32) (local $w f64) (local $f f64) (local $i i32) (local $off i32) (local $at i32)
    (local.set $q (i32.add (local.get $qty) (i32.shl (local.get $j) (i32.const 3))))
    (local.set $w (f64.load (local.get $q)))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $w (f64.add (local.get $w) (f64.mul (f64.load (i32.add (local.get $cj) (local.get $off))) (f64.load (i32.add (local.get $yc) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.set $f (f64.mul (local.get $tau) (local.get $w)))
    (if (f64.eq (local.get $f) (f64.const 0)) (then (return)))
    (f64.store (local.get $q) (f64.sub (f64.load (local.get $q)) (local.get $f)))
    (local.set $i (i32.const 0))
    (block $done2
      (loop $next2
        (br_if $done2 (i32.ge_s (local.get $i) (local.get $mb)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $at (i32.add (local.get $yc) (local.get $off)))
        (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $f) (f64.load (i32.add (local.get $cj) (local.get $off))))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next2))))

  ;; Householder reflections that zero the mb x p block C (leading dimension ld) against R
  ;; (annihilate): four, then two, then one column at a time, as the JavaScript does.
  (func $annihilate (param $R i32) (param $qty i32) (param $C i32) (param $yc i32) (param $ld i32) (param $p i32) (param $mb i32)
    (local $j i32) (local $k i32) (local $cj i32) (local $rjj i32) (local $alpha f64) (local $beta f64) (local $tau f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $j) (local.get $p)))
        (local.set $cj (i32.add (local.get $C) (i32.shl (i32.mul (local.get $j) (local.get $ld)) (i32.const 3))))
        (local.set $rjj (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $p)) (local.get $j)) (i32.const 3))))
        (local.set $alpha (f64.load (local.get $rjj)))
        (local.set $beta (call $reflector (local.get $cj) (local.get $mb) (local.get $alpha)))
        (if (f64.eq (local.get $beta) (local.get $beta))
          (then
            (local.set $tau (f64.div (f64.sub (local.get $beta) (local.get $alpha)) (local.get $beta)))
            (local.set $k (i32.add (local.get $j) (i32.const 1)))
            (block $fours (loop $four
              (br_if $fours (i32.ge_s (i32.add (local.get $k) (i32.const 3)) (local.get $p)))
              (call $reflectFour (local.get $R) (local.get $C) (local.get $ld) (local.get $p) (local.get $j) (local.get $k) (local.get $mb) (local.get $tau))
              (local.set $k (i32.add (local.get $k) (i32.const 4)))
              (br $four)))
            (block $twos (loop $two
              (br_if $twos (i32.ge_s (i32.add (local.get $k) (i32.const 1)) (local.get $p)))
              (call $reflectTwo (local.get $R) (local.get $C) (local.get $ld) (local.get $p) (local.get $j) (local.get $k) (local.get $mb) (local.get $tau))
              (local.set $k (i32.add (local.get $k) (i32.const 2)))
              (br $two)))
            (block $ones (loop $one
              (br_if $ones (i32.ge_s (local.get $k) (local.get $p)))
              (call $reflectOne (local.get $R) (local.get $C) (local.get $ld) (local.get $p) (local.get $j) (local.get $k) (local.get $mb) (local.get $tau))
              (local.set $k (i32.add (local.get $k) (i32.const 1)))
              (br $one)))
            (call $reflectTarget (local.get $qty) (local.get $yc) (local.get $cj) (local.get $mb) (local.get $tau) (local.get $j))
            (f64.store (local.get $rjj) (local.get $beta))))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $next))))

  ;; Folds the m rows of the column-major block X (m x p) and y into [R; qty] in pieces of at most
  ;; `chunk` rows (qr-fold.ts, foldRowsJs): each piece is copied into the work block C
  ;; (leading dimension chunk) and yc, checked, annihilated, and the sum of squares of what is left
  ;; of its right-hand side is added to the global rss. Returns 0; 1 when a value is not finite
  ;; (badRow and badColumn say where; the pieces before it stay folded, as in JavaScript).
  (func (export "fold") (param $R i32) (param $qty i32) (param $X i32) (param $y i32) (param $m i32) (param $p i32)
      (param $C i32) (param $yc i32) (param $chunk i32) (result i32)
    (local $start i32) (local $mb i32) (local $j i32) (local $bad i32)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $start) (local.get $m)))
        (local.set $mb (select (local.get $chunk) (i32.sub (local.get $m) (local.get $start))
          (i32.lt_s (local.get $chunk) (i32.sub (local.get $m) (local.get $start)))))
        (local.set $j (i32.const 0))
        (block $copied
          (loop $column
            (br_if $copied (i32.ge_s (local.get $j) (local.get $p)))
            (local.set $bad (call $copyChecked
              (i32.add (local.get $X) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $m)) (local.get $start)) (i32.const 3)))
              (i32.add (local.get $C) (i32.shl (i32.mul (local.get $j) (local.get $chunk)) (i32.const 3)))
              (local.get $mb)))
            (if (i32.ge_s (local.get $bad) (i32.const 0))
              (then
                (global.set $badRow (i32.add (local.get $start) (local.get $bad)))
                (global.set $badColumn (local.get $j))
                (return (i32.const 1))))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $column)))
        (local.set $bad (call $copyChecked (i32.add (local.get $y) (i32.shl (local.get $start) (i32.const 3))) (local.get $yc) (local.get $mb)))
        (if (i32.ge_s (local.get $bad) (i32.const 0))
          (then
            (global.set $badRow (i32.add (local.get $start) (local.get $bad)))
            (global.set $badColumn (i32.const -1))
            (return (i32.const 1))))
        (call $annihilate (local.get $R) (local.get $qty) (local.get $C) (local.get $yc) (local.get $chunk) (local.get $p) (local.get $mb))
        (global.set $rss (f64.add (global.get $rss) (call $sumOfSquares (local.get $yc) (local.get $mb))))
        (local.set $start (i32.add (local.get $start) (local.get $chunk)))
        (br $next)))
    (i32.const 0))

  ;; Leverages of the m rows of the column-major block X (m x p) under a full-rank factor R
  ;; (leverages.ts, leverageChunk): z = R^-T x by forward substitution down whole columns of Z
  ;; (m x p), out[i] = sum_j z_ij^2. The subtractions run in the JavaScript's order (k ascending).
  (func (export "leverages") (param $R i32) (param $p i32) (param $X i32) (param $m i32) (param $Z i32) (param $out i32)
    (local $i i32) (local $j i32) (local $k i32) (local $colBytes i32) (local $zj i32) (local $zk i32)
    (local $r f64) (local $diag f64) (local $z f64) (local $off i32) (local $at i32)
    (local.set $colBytes (i32.shl (local.get $m) (i32.const 3)))
    (memory.fill (local.get $out) (i32.const 0) (local.get $colBytes))
    (block $columns
      (loop $column
        (br_if $columns (i32.ge_s (local.get $j) (local.get $p)))
        (local.set $zj (i32.add (local.get $Z) (i32.mul (local.get $j) (local.get $colBytes))))
        (memory.copy (local.get $zj) (i32.add (local.get $X) (i32.mul (local.get $j) (local.get $colBytes))) (local.get $colBytes))
        (local.set $k (i32.const 0))
        (block $earlier
          (loop $previous
            (br_if $earlier (i32.ge_s (local.get $k) (local.get $j)))
            (local.set $r (f64.load (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $p)) (local.get $k)) (i32.const 3)))))
            (local.set $zk (i32.add (local.get $Z) (i32.mul (local.get $k) (local.get $colBytes))))
            (local.set $off (i32.const 0))
            (block $rows
              (loop $row
                (br_if $rows (i32.ge_s (local.get $off) (local.get $colBytes)))
                (local.set $at (i32.add (local.get $zj) (local.get $off)))
                (f64.store (local.get $at) (f64.sub (f64.load (local.get $at)) (f64.mul (local.get $r) (f64.load (i32.add (local.get $zk) (local.get $off))))))
                (local.set $off (i32.add (local.get $off) (i32.const 8)))
                (br $row)))
            (local.set $k (i32.add (local.get $k) (i32.const 1)))
            (br $previous)))
        (local.set $diag (f64.load (i32.add (local.get $R) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $p)) (local.get $j)) (i32.const 3)))))
        (local.set $i (i32.const 0))
        (block $scaled
          (loop $scale
            (br_if $scaled (i32.ge_s (local.get $i) (local.get $m)))
            (local.set $off (i32.shl (local.get $i) (i32.const 3)))
            (local.set $z (f64.div (f64.load (i32.add (local.get $zj) (local.get $off))) (local.get $diag)))
            (f64.store (i32.add (local.get $zj) (local.get $off)) (local.get $z))
            (local.set $at (i32.add (local.get $out) (local.get $off)))
            (f64.store (local.get $at) (f64.add (f64.load (local.get $at)) (f64.mul (local.get $z) (local.get $z))))
            (local.set $i (i32.add (local.get $i) (i32.const 1)))
            (br $scale)))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $column))))

  ;; Exact error of a floating-point product, a*b - fl(a*b) (Dekker / Veltkamp splitting;
  ;; refine.ts, twoProductError).
  (func $twoProductError (param $a f64) (param $b f64) (param $prod f64) (result f64)
    (local $t f64) (local $ah f64) (local $al f64) (local $bh f64) (local $bl f64)
    (local.set $t (f64.mul (f64.const 134217729) (local.get $a)))
    (local.set $ah (f64.sub (local.get $t) (f64.sub (local.get $t) (local.get $a))))
    (local.set $al (f64.sub (local.get $a) (local.get $ah)))
    (local.set $t (f64.mul (f64.const 134217729) (local.get $b)))
    (local.set $bh (f64.sub (local.get $t) (f64.sub (local.get $t) (local.get $b))))
    (local.set $bl (f64.sub (local.get $b) (local.get $bh)))
    (f64.sub (f64.mul (local.get $al) (local.get $bl))
      (f64.sub (f64.sub (f64.sub (local.get $prod) (f64.mul (local.get $ah) (local.get $bh))) (f64.mul (local.get $ah) (local.get $bl)))
        (f64.mul (local.get $al) (local.get $bh)))))

  ;; r = y - X w for the m rows of the column-major block X (m x p) as double-double numbers
  ;; hi + lo, each by a compensated dot product (refine.ts, residualsInto).
  (func $residuals (param $X i32) (param $y i32) (param $m i32) (param $w i32) (param $p i32) (param $hi i32) (param $lo i32)
    (local $i i32) (local $j i32) (local $off i32) (local $s f64) (local $c f64) (local $a f64) (local $wj f64)
    (local $prod f64) (local $t f64) (local $z f64) (local $h f64)
    (block $rows
      (loop $row
        (br_if $rows (i32.ge_s (local.get $i) (local.get $m)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $s (f64.load (i32.add (local.get $y) (local.get $off))))
        (local.set $c (f64.const 0))
        (local.set $j (i32.const 0))
        (block $terms
          (loop $term
            (br_if $terms (i32.ge_s (local.get $j) (local.get $p)))
            (local.set $a (f64.neg (f64.load (i32.add (local.get $X) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $m)) (local.get $i)) (i32.const 3))))))
            (local.set $wj (f64.load (i32.add (local.get $w) (i32.shl (local.get $j) (i32.const 3)))))
            (local.set $prod (f64.mul (local.get $a) (local.get $wj)))
            (local.set $t (f64.add (local.get $s) (local.get $prod)))
            (local.set $z (f64.sub (local.get $t) (local.get $s)))
            (local.set $c (f64.add (local.get $c)
              (f64.add (f64.add (f64.sub (local.get $s) (f64.sub (local.get $t) (local.get $z))) (f64.sub (local.get $prod) (local.get $z)))
                (call $twoProductError (local.get $a) (local.get $wj) (local.get $prod)))))
            (local.set $s (local.get $t))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $term)))
        (local.set $h (f64.add (local.get $s) (local.get $c)))
        (local.set $z (f64.sub (local.get $h) (local.get $s)))
        (f64.store (i32.add (local.get $hi) (local.get $off)) (local.get $h))
        (f64.store (i32.add (local.get $lo) (local.get $off))
          (f64.add (f64.sub (local.get $s) (f64.sub (local.get $h) (local.get $z))) (f64.sub (local.get $c) (local.get $z))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $row))))

  ;; Adds to the running (gHi, gLo) at the given addresses the dot product of the m values at x
  ;; with r = hi + lo: Dot2 with hi, plus the plain dot with lo (refine.ts, addColumnDot2).
  (func $columnDot2 (param $x i32) (param $m i32) (param $hi i32) (param $lo i32) (param $gHi i32) (param $gLo i32)
    (local $i i32) (local $off i32) (local $sum f64) (local $comp f64) (local $a f64) (local $h f64) (local $prod f64) (local $t f64) (local $z f64)
    (local.set $sum (f64.load (local.get $gHi)))
    (local.set $comp (f64.load (local.get $gLo)))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $m)))
        (local.set $off (i32.shl (local.get $i) (i32.const 3)))
        (local.set $a (f64.load (i32.add (local.get $x) (local.get $off))))
        (local.set $h (f64.load (i32.add (local.get $hi) (local.get $off))))
        (local.set $prod (f64.mul (local.get $a) (local.get $h)))
        (local.set $t (f64.add (local.get $sum) (local.get $prod)))
        (local.set $z (f64.sub (local.get $t) (local.get $sum)))
        (local.set $comp (f64.add (local.get $comp)
          (f64.add
            (f64.add (f64.add (f64.sub (local.get $sum) (f64.sub (local.get $t) (local.get $z))) (f64.sub (local.get $prod) (local.get $z)))
              (call $twoProductError (local.get $a) (local.get $h) (local.get $prod)))
            (f64.mul (local.get $a) (f64.load (i32.add (local.get $lo) (local.get $off)))))))
        (local.set $sum (local.get $t))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (f64.store (local.get $gHi) (local.get $sum))
    (f64.store (local.get $gLo) (local.get $comp)))

  ;; One block of the refinement pass (refine.ts, refineRowsJs): the residuals of the
  ;; m rows under w (p values) as hi + lo, then for each column j the compensated dot product of
  ;; column j with them added to gHi[j], gLo[j]. Returns the sum of squares of hi.
  (func (export "refine") (param $X i32) (param $y i32) (param $m i32) (param $w i32) (param $p i32)
      (param $hi i32) (param $lo i32) (param $gHi i32) (param $gLo i32) (result f64)
    (local $j i32) (local $ss f64)
    (call $residuals (local.get $X) (local.get $y) (local.get $m) (local.get $w) (local.get $p) (local.get $hi) (local.get $lo))
    (local.set $ss (call $sumOfSquares (local.get $hi) (local.get $m)))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $j) (local.get $p)))
        (call $columnDot2
          (i32.add (local.get $X) (i32.shl (i32.mul (local.get $j) (local.get $m)) (i32.const 3)))
          (local.get $m) (local.get $hi) (local.get $lo)
          (i32.add (local.get $gHi) (i32.shl (local.get $j) (i32.const 3)))
          (i32.add (local.get $gLo) (i32.shl (local.get $j) (i32.const 3))))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $next)))
    (local.get $ss))

  ;; out[i] += sum_j X[j*m + i] w[j] for the m rows of the column-major block X (m x p), the
  ;; columns added one after another, those whose weight is 0 left out (products.ts,
  ;; addProductsJs: its four-column sweeps add in the same order).
  (func $addProducts (export "addProducts") (param $out i32) (param $X i32) (param $m i32) (param $w i32) (param $p i32)
    (local $j i32) (local $wj f64) (local $col i32) (local $off i32) (local $end i32) (local $at i32)
    (local.set $end (i32.shl (local.get $m) (i32.const 3)))
    (block $columns
      (loop $column
        (br_if $columns (i32.ge_s (local.get $j) (local.get $p)))
        (local.set $wj (f64.load (i32.add (local.get $w) (i32.shl (local.get $j) (i32.const 3)))))
        (if (f64.ne (local.get $wj) (f64.const 0))
          (then
            (local.set $col (i32.add (local.get $X) (i32.mul (local.get $j) (local.get $end))))
            (local.set $off (i32.const 0))
            (block $rows
              (loop $row
                (br_if $rows (i32.ge_s (local.get $off) (local.get $end)))
                (local.set $at (i32.add (local.get $out) (local.get $off)))
                (f64.store (local.get $at) (f64.add (f64.load (local.get $at)) (f64.mul (f64.load (i32.add (local.get $col) (local.get $off))) (local.get $wj))))
                (local.set $off (i32.add (local.get $off) (i32.const 8)))
                (br $row)))))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $column))))

;; For each part f < count (kept rows offsets[f] .. offsets[f+1] - 1, i32 offsets): the chunks
  ;; of `chunk` rows of the extended rows [scale[t] X[index[t], :] | u[t] | 0] gathered into `work`,
  ;; then the tiles (j, j+1) x (k, k+1), k >= j, of their Gram added to G_f = G + f q q (gram.ts,
  ;; addGramRowsJs: the same operations in the same order). `work` holds the columns in pairs, row
  ;; by row: column j of row t at work + (j >> 1) * 16 chunk + 16 t + 8 (j & 1), so that one v128
  ;; load reads (x_j, x_j+1) of a row; the tile's four sums are two f64x2 lanes each,
  ;; (s00, s10) += (x0, x1) * (y0, y0) and (s01, s11) += (x0, x1) * (y1, y1): per lane the same
  ;; multiply and add, in the same row order, as the scalar sums (f64x2 arithmetic is IEEE 754
  ;; per lane, and WebAssembly never fuses a multiply and an add). Two tiles side by side,
  ;; (j, j+1) x (k .. k+3), are summed in one loop over the rows where both are in the triangle
  ;; (four independent sums per row instead of two; each sum the same).
  (func (export "gramRows") (param $G i32) (param $q i32) (param $X i32) (param $m i32) (param $p i32)
    (param $index i32) (param $scale i32) (param $u i32) (param $offsets i32) (param $count i32) (param $work i32) (param $chunk i32)
    (local $f i32) (local $g i32) (local $s i32) (local $stop i32) (local $n i32) (local $j i32) (local $k i32) (local $t i32)
    (local $src i32) (local $dst i32) (local $ldp i32) (local $at i32)
    (local $a i32) (local $b i32) (local $i i32) (local $end i32) (local $e i32)
    (local $x v128) (local $acc0 v128) (local $acc1 v128) (local $acc2 v128) (local $acc3 v128) (local $b2 i32)
    (local.set $ldp (i32.shl (local.get $chunk) (i32.const 4)))
    (block $parts
      (loop $part
        (br_if $parts (i32.ge_s (local.get $f) (local.get $count)))
        (local.set $g (i32.add (local.get $G) (i32.shl (i32.mul (local.get $f) (i32.mul (local.get $q) (local.get $q))) (i32.const 3))))
        (local.set $s (i32.load (i32.add (local.get $offsets) (i32.shl (local.get $f) (i32.const 2)))))
        (local.set $stop (i32.load (i32.add (local.get $offsets) (i32.shl (i32.add (local.get $f) (i32.const 1)) (i32.const 2)))))
        (block $chunks
          (loop $chunkLoop
            (br_if $chunks (i32.ge_s (local.get $s) (local.get $stop)))
            (local.set $n (i32.sub (local.get $stop) (local.get $s)))
            (if (i32.gt_s (local.get $n) (local.get $chunk)) (then (local.set $n (local.get $chunk))))
            ;; column j < p of row t: scale[s + t] * X[j*m + index[s + t]]
            (local.set $j (i32.const 0))
            (block $cols
              (loop $col
                (br_if $cols (i32.ge_s (local.get $j) (local.get $p)))
                (local.set $src (i32.add (local.get $X) (i32.shl (i32.mul (local.get $j) (local.get $m)) (i32.const 3))))
                (local.set $dst (i32.add (i32.add (local.get $work) (i32.mul (i32.shr_u (local.get $j) (i32.const 1)) (local.get $ldp)))
                  (i32.shl (i32.and (local.get $j) (i32.const 1)) (i32.const 3))))
                (local.set $t (i32.const 0))
                (block $gathered
                  (loop $gather
                    (br_if $gathered (i32.ge_s (local.get $t) (local.get $n)))
                    (local.set $at (i32.add (local.get $s) (local.get $t)))
                    (f64.store (i32.add (local.get $dst) (i32.shl (local.get $t) (i32.const 4)))
                      (f64.mul
                        (f64.load (i32.add (local.get $scale) (i32.shl (local.get $at) (i32.const 3))))
                        (f64.load (i32.add (local.get $src) (i32.shl (i32.load (i32.add (local.get $index) (i32.shl (local.get $at) (i32.const 2)))) (i32.const 3))))))
                    (local.set $t (i32.add (local.get $t) (i32.const 1)))
                    (br $gather)))
                (local.set $j (i32.add (local.get $j) (i32.const 1)))
                (br $col)))
            ;; column p: u[s + t]; the padding column p + 1 < q: zero
            (local.set $dst (i32.add (i32.add (local.get $work) (i32.mul (i32.shr_u (local.get $p) (i32.const 1)) (local.get $ldp)))
              (i32.shl (i32.and (local.get $p) (i32.const 1)) (i32.const 3))))
            (local.set $src (i32.add (local.get $u) (i32.shl (local.get $s) (i32.const 3))))
            (local.set $t (i32.const 0))
            (block $copied
              (loop $copy
                (br_if $copied (i32.ge_s (local.get $t) (local.get $n)))
                (f64.store (i32.add (local.get $dst) (i32.shl (local.get $t) (i32.const 4)))
                  (f64.load (i32.add (local.get $src) (i32.shl (local.get $t) (i32.const 3)))))
                (if (i32.lt_s (i32.add (local.get $p) (i32.const 1)) (local.get $q))
                  (then (f64.store offset=8 (i32.add (local.get $dst) (i32.shl (local.get $t) (i32.const 4))) (f64.const 0))))
                (local.set $t (i32.add (local.get $t) (i32.const 1)))
                (br $copy)))
            ;; the tiles
            (local.set $end (i32.shl (local.get $n) (i32.const 4)))
            (local.set $j (i32.const 0))
            (block $js
              (loop $jLoop
                (br_if $js (i32.ge_s (local.get $j) (local.get $q)))
                (local.set $a (i32.add (local.get $work) (i32.mul (i32.shr_u (local.get $j) (i32.const 1)) (local.get $ldp))))
                (local.set $k (local.get $j))
                (block $ks
                  (loop $kLoop
                    (br_if $ks (i32.ge_s (local.get $k) (local.get $q)))
                    (local.set $b (i32.add (local.get $work) (i32.mul (i32.shr_u (local.get $k) (i32.const 1)) (local.get $ldp))))
                    (local.set $acc0 (f64x2.splat (f64.const 0)))
                    (local.set $acc1 (f64x2.splat (f64.const 0)))
                    (local.set $i (i32.const 0))
                    (if (i32.lt_s (i32.add (local.get $k) (i32.const 2)) (local.get $q))
                      (then
                        ;; two tiles at once, (j, j+1) x (k .. k+3): four independent sums per row
                        (local.set $b2 (i32.add (local.get $b) (local.get $ldp)))
                        (local.set $acc2 (f64x2.splat (f64.const 0)))
                        (local.set $acc3 (f64x2.splat (f64.const 0)))
                        (block $rows4
                          (loop $row4
                            (br_if $rows4 (i32.ge_s (local.get $i) (local.get $end)))
                            (local.set $x (v128.load (i32.add (local.get $a) (local.get $i))))
                            (local.set $acc0 (f64x2.add (local.get $acc0)
                              (f64x2.mul (local.get $x) (v128.load64_splat (i32.add (local.get $b) (local.get $i))))))
                            (local.set $acc1 (f64x2.add (local.get $acc1)
                              (f64x2.mul (local.get $x) (v128.load64_splat offset=8 (i32.add (local.get $b) (local.get $i))))))
                            (local.set $acc2 (f64x2.add (local.get $acc2)
                              (f64x2.mul (local.get $x) (v128.load64_splat (i32.add (local.get $b2) (local.get $i))))))
                            (local.set $acc3 (f64x2.add (local.get $acc3)
                              (f64x2.mul (local.get $x) (v128.load64_splat offset=8 (i32.add (local.get $b2) (local.get $i))))))
                            (local.set $i (i32.add (local.get $i) (i32.const 16)))
                            (br $row4)))
                        ;; columns k .. k+3 of G_f, rows j and j + 1 of each
                        (local.set $e (i32.add (local.get $g) (i32.shl (i32.add (i32.mul (local.get $k) (local.get $q)) (local.get $j)) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc0)))
                        (local.set $e (i32.add (local.get $e) (i32.shl (local.get $q) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc1)))
                        (local.set $e (i32.add (local.get $e) (i32.shl (local.get $q) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc2)))
                        (local.set $e (i32.add (local.get $e) (i32.shl (local.get $q) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc3)))
                        (local.set $k (i32.add (local.get $k) (i32.const 4))))
                      (else
                        (block $rows
                          (loop $row
                            (br_if $rows (i32.ge_s (local.get $i) (local.get $end)))
                            (local.set $x (v128.load (i32.add (local.get $a) (local.get $i))))
                            (local.set $acc0 (f64x2.add (local.get $acc0)
                              (f64x2.mul (local.get $x) (v128.load64_splat (i32.add (local.get $b) (local.get $i))))))
                            (local.set $acc1 (f64x2.add (local.get $acc1)
                              (f64x2.mul (local.get $x) (v128.load64_splat offset=8 (i32.add (local.get $b) (local.get $i))))))
                            (local.set $i (i32.add (local.get $i) (i32.const 16)))
                            (br $row)))
                        ;; (G_f[k*q + j], G_f[k*q + j + 1]) += (s00, s10); (G_f[(k+1)*q + j], G_f[(k+1)*q + j + 1]) += (s01, s11)
                        (local.set $e (i32.add (local.get $g) (i32.shl (i32.add (i32.mul (local.get $k) (local.get $q)) (local.get $j)) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc0)))
                        (local.set $e (i32.add (local.get $e) (i32.shl (local.get $q) (i32.const 3))))
                        (v128.store (local.get $e) (f64x2.add (v128.load (local.get $e)) (local.get $acc1)))
                        (local.set $k (i32.add (local.get $k) (i32.const 2)))))
                    (br $kLoop)))
                (local.set $j (i32.add (local.get $j) (i32.const 2)))
                (br $jLoop)))
            (local.set $s (i32.add (local.get $s) (local.get $n)))
            (br $chunkLoop)))
        (local.set $f (i32.add (local.get $f) (i32.const 1)))
        (br $part))))

  ;; Out-of-fold errors of one block for one setting (out-of-fold.ts,
  ;; outOfFoldRowsJs): pred = the prediction of each row with the coefficients fitted without its
  ;; fold (W[j*k + f], f = folds[i], an i32 per row), then errors[f] += (y[i] - pred[i])^2 in row
  ;; order. With `single` >= 0 every row is of that fold, and the predictions are addProducts with
  ;; its coefficients (zero weights left out, as there).
  (func (export "outOfFold") (param $X i32) (param $m i32) (param $p i32) (param $W i32) (param $k i32) (param $folds i32)
      (param $single i32) (param $y i32) (param $pred i32) (param $column i32) (param $errors i32)
    (local $i i32) (local $j i32) (local $col i32) (local $base i32) (local $at i32) (local $f i32) (local $r f64)
    (memory.fill (local.get $pred) (i32.const 0) (i32.shl (local.get $m) (i32.const 3)))
    (if (i32.ge_s (local.get $single) (i32.const 0))
      (then
        (block $copied
          (loop $copy
            (br_if $copied (i32.ge_s (local.get $j) (local.get $p)))
            (f64.store (i32.add (local.get $column) (i32.shl (local.get $j) (i32.const 3)))
              (f64.load (i32.add (local.get $W) (i32.shl (i32.add (i32.mul (local.get $j) (local.get $k)) (local.get $single)) (i32.const 3)))))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $copy)))
        (call $addProducts (local.get $pred) (local.get $X) (local.get $m) (local.get $column) (local.get $p)))
      (else
        (block $columns
          (loop $nextColumn
            (br_if $columns (i32.ge_s (local.get $j) (local.get $p)))
            (local.set $col (i32.add (local.get $X) (i32.shl (i32.mul (local.get $j) (local.get $m)) (i32.const 3))))
            (local.set $base (i32.mul (local.get $j) (local.get $k)))
            (local.set $i (i32.const 0))
            (block $rows
              (loop $row
                (br_if $rows (i32.ge_s (local.get $i) (local.get $m)))
                (local.set $at (i32.add (local.get $pred) (i32.shl (local.get $i) (i32.const 3))))
                (f64.store (local.get $at)
                  (f64.add (f64.load (local.get $at))
                    (f64.mul (f64.load (i32.add (local.get $col) (i32.shl (local.get $i) (i32.const 3))))
                      (f64.load (i32.add (local.get $W)
                        (i32.shl (i32.add (local.get $base) (i32.load (i32.add (local.get $folds) (i32.shl (local.get $i) (i32.const 2))))) (i32.const 3)))))))
                (local.set $i (i32.add (local.get $i) (i32.const 1)))
                (br $row)))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $nextColumn)))))
    (local.set $i (i32.const 0))
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $m)))
        (local.set $r (f64.sub (f64.load (i32.add (local.get $y) (i32.shl (local.get $i) (i32.const 3))))
          (f64.load (i32.add (local.get $pred) (i32.shl (local.get $i) (i32.const 3))))))
        (local.set $f (i32.load (i32.add (local.get $folds) (i32.shl (local.get $i) (i32.const 2)))))
        (local.set $at (i32.add (local.get $errors) (i32.shl (local.get $f) (i32.const 3))))
        (f64.store (local.get $at) (f64.add (f64.load (local.get $at)) (f64.mul (local.get $r) (local.get $r))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next))))

  ;; The degree columns of a polynomial term for m values x (polynomial-columns.ts): column 1 is
  ;; z = (x - shift) / scale (x itself when raw is 1), column k the previous column times z; written
  ;; one after another from out.
  (func (export "polynomialColumns") (param $x i32) (param $m i32) (param $shift f64) (param $scale f64) (param $raw i32)
      (param $degree i32) (param $out i32)
    (local $k i32) (local $off i32) (local $end i32) (local $prev i32) (local $next i32)
    (local.set $end (i32.shl (local.get $m) (i32.const 3)))
    (if (local.get $raw)
      (then (memory.copy (local.get $out) (local.get $x) (local.get $end)))
      (else
        (block $done
          (loop $next
            (br_if $done (i32.ge_s (local.get $off) (local.get $end)))
            (f64.store (i32.add (local.get $out) (local.get $off))
              (f64.div (f64.sub (f64.load (i32.add (local.get $x) (local.get $off))) (local.get $shift)) (local.get $scale)))
            (local.set $off (i32.add (local.get $off) (i32.const 8)))
            (br $next)))))
    (local.set $k (i32.const 1))
    (block $powers
      (loop $power
        (br_if $powers (i32.ge_s (local.get $k) (local.get $degree)))
        (local.set $prev (i32.add (local.get $out) (i32.mul (i32.sub (local.get $k) (i32.const 1)) (local.get $end))))
        (local.set $next (i32.add (local.get $out) (i32.mul (local.get $k) (local.get $end))))
        (local.set $off (i32.const 0))
        (block $rows
          (loop $row
            (br_if $rows (i32.ge_s (local.get $off) (local.get $end)))
            (f64.store (i32.add (local.get $next) (local.get $off))
              (f64.mul (f64.load (i32.add (local.get $prev) (local.get $off))) (f64.load (i32.add (local.get $out) (local.get $off)))))
            (local.set $off (i32.add (local.get $off) (i32.const 8)))
            (br $row)))
        (local.set $k (i32.add (local.get $k) (i32.const 1)))
        (br $power))))

  ;; Index of the first of the n values at a whose magnitude is not within max (NaN included), or
  ;; -1 (range-check.ts, the design's range check).
  (func (export "firstBeyond") (param $a i32) (param $n i32) (param $max f64) (result i32)
    (local $i i32)
    (block $done
      (loop $next
        (br_if $done (i32.ge_s (local.get $i) (local.get $n)))
        (if (i32.eqz (f64.le (f64.abs (f64.load (i32.add (local.get $a) (i32.shl (local.get $i) (i32.const 3))))) (local.get $max)))
          (then (return (local.get $i))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (i32.const -1))
)
