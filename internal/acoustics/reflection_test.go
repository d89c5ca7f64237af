package acoustics

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"
)

// printedValue is a table value with the number of decimals it was printed with.
type printedValue struct {
	v        float64
	decimals int
}

func (p printedValue) ok(got float64) bool { return withinAbs(got, p.v, printed(p.decimals)) }

func TestFloorReflectionTable(t *testing.T) {
	// acoustics.md §3.1 check values, COMPUTED from the image-source model
	// (FROM MEMORY, high confidence, textbook) with c = 343.2 m/s; each value
	// is checked to half a unit of its last printed digit. Rows whose table
	// cell is "—" have no value (nil).
	p := func(v float64, d int) *printedValue { return &printedValue{v, d} }
	tests := []struct {
		hs, hm, d float64
		delta     printedValue
		nulls     []*printedValue // n = 0, 1, 2
		peaks     []*printedValue // n = 1, 2
		q         printedValue
		maxDB     printedValue
		minDB     *printedValue
	}{
		{2.0, 1.5, 20, printedValue{0.29769, 5}, []*printedValue{p(576.4, 1), p(1729.3, 1), p(2882.2, 1)},
			[]*printedValue{p(1152.9, 1), p(2305.7, 1)}, printedValue{0.98534, 5}, printedValue{5.957, 3}, p(-36.68, 2)},
		{1.0, 1.0, 5.08, printedValue{0.37952, 5}, []*printedValue{p(452.1, 1), p(1356.4, 1), p(2260.7, 1)},
			[]*printedValue{p(904.3, 1), p(1808.6, 1)}, printedValue{0.93048, 5}, printedValue{5.713, 3}, p(-23.16, 2)},
		{1.5, 1.2, 30, printedValue{0.11975, 5}, []*printedValue{p(1432.9, 1), p(4298.8, 1), p(7164.6, 1)},
			[]*printedValue{p(2865.9, 1), p(5731.7, 1)}, printedValue{0.99602, 5}, printedValue{6.003, 3}, p(-48.0, 1)},
		{3.0, 1.2, 45, printedValue{0.15959, 5}, []*printedValue{p(1075.3, 1), p(3225.8, 1), p(5376.3, 1)},
			[]*printedValue{p(2150.5, 1), p(4301.0, 1)}, printedValue{0.99647, 5}, printedValue{6.005, 3}, p(-49.0, 1)},
		{1.0, 0.01, 5, printedValue{0.00392, 5}, []*printedValue{p(43750, 0)},
			[]*printedValue{p(87499, 0)}, printedValue{0.99923, 5}, printedValue{6.017, 3}, nil},
		{1.0, 0.007, 10, printedValue{0.00139, 5}, []*printedValue{p(123183, 0)},
			nil, printedValue{0.99986, 5}, printedValue{6.020, 3}, nil},
	}
	for _, tt := range tests {
		t.Run(fmt.Sprintf("hs%g_hm%g_d%g", tt.hs, tt.hm, tt.d), func(t *testing.T) {
			r := FloorReflection(tt.hs, tt.hm, tt.d)
			if !tt.delta.ok(r.PathDifference) {
				t.Errorf("got Δ = %.7f m, want %g m", r.PathDifference, tt.delta.v)
			}
			if got := r.Reflected - r.Direct; !withinAbs(got, r.PathDifference, 1e-12) {
				t.Errorf("got r2 − r1 = %.15g m, want Δ = %.15g m", got, r.PathDifference)
			}
			if !tt.q.ok(r.Q) {
				t.Errorf("got Q = %.7f, want %g", r.Q, tt.q.v)
			}
			for n, want := range tt.nulls {
				if got := r.NullFrequency(n, cISO); !want.ok(got) {
					t.Errorf("got null %d at %.3f Hz, want %g Hz", n, got, want.v)
				}
			}
			for i, want := range tt.peaks {
				if got := r.PeakFrequency(i+1, cISO); !want.ok(got) {
					t.Errorf("got peak %d at %.3f Hz, want %g Hz", i+1, got, want.v)
				}
			}
			if got := r.LevelChange(r.PeakFrequency(1, cISO), cISO); !tt.maxDB.ok(got) {
				t.Errorf("got ΔL at the first peak %+.4f dB, want %+g dB", got, tt.maxDB.v)
			}
			if tt.minDB != nil {
				if got := r.LevelChange(r.NullFrequency(0, cISO), cISO); !tt.minDB.ok(got) {
					t.Errorf("got ΔL at the first null %+.4f dB, want %+g dB", got, tt.minDB.v)
				}
			}
		})
	}
}

func TestFloorReflectionSpotLevels(t *testing.T) {
	// acoustics.md §3.1 spot values for hs = 2, hm = 1.5, d = 20 (COMPUTED).
	r := FloorReflection(2, 1.5, 20)
	tests := []struct {
		f, want float64
	}{
		{100, 5.63}, {1000, 5.18}, {576.46, -36.68},
	}
	for _, tt := range tests {
		if got := r.LevelChange(tt.f, cISO); !withinAbs(got, tt.want, printed(2)) {
			t.Errorf("%g Hz: got %+.4f dB, want %+.2f dB", tt.f, got, tt.want)
		}
	}
}

func TestFlushMicrophone(t *testing.T) {
	// acoustics.md §3.2: a diaphragm flush with a rigid floor reads
	// 20·log10 2 = +6.02 dB at all frequencies (COMPUTED; standard practice,
	// FROM MEMORY, high). The §3.1 rows with hm = 10 mm and 7 mm approach it
	// (+6.017 and +6.020 dB, checked above).
	want := 20 * math.Log10(2)
	if !withinAbs(want, 6.02, printed(2)) {
		t.Fatalf("got 20·log10 2 = %g, want 6.02", want)
	}
	for _, g := range []struct{ hs, d float64 }{{1, 5}, {2, 20}, {0, 3}, {0, 0}} {
		r := FloorReflection(g.hs, 0, g.d)
		if r.PathDifference != 0 || r.Q != 1 {
			t.Errorf("hs %g, d %g: got Δ %g, Q %g, want 0 and 1", g.hs, g.d, r.PathDifference, r.Q)
		}
		for _, f := range []float64{0, 50, 1e3, 100e3, 1e9} {
			if got := r.LevelChange(f, cISO); !withinAbs(got, want, 1e-12) {
				t.Errorf("hs %g, d %g, %g Hz: got %+.6f dB, want %+.6f dB", g.hs, g.d, f, got, want)
			}
		}
		if f := r.NullFrequency(0, cISO); !math.IsInf(f, 1) {
			t.Errorf("hs %g, d %g: got first null %g Hz, want +Inf", g.hs, g.d, f)
		}
		if f := r.PeakFrequency(1, cISO); !math.IsInf(f, 1) {
			t.Errorf("hs %g, d %g: got first peak %g Hz, want +Inf", g.hs, g.d, f)
		}
	}
}

func TestLevelChangeBounds(t *testing.T) {
	// Property of the image-source formula (DERIVED, acoustics.md §3.1):
	// 20·log10(1 − Q) ≤ ΔL ≤ 20·log10(1 + Q). Random geometries with a fixed
	// seed.
	rng := rand.New(rand.NewPCG(1, 2))
	const slack = 1e-9 // dB, rounding
	for i := 0; i < 5000; i++ {
		hs, hm, d := 5*rng.Float64(), 3*rng.Float64(), 60*rng.Float64()
		f := math.Pow(10, 1+4*rng.Float64()) // 10 Hz to 100 kHz
		r := FloorReflection(hs, hm, d)
		got := r.LevelChange(f, cISO)
		lo, hi := 20*math.Log10(1-r.Q), 20*math.Log10(1+r.Q)
		if math.IsNaN(got) || got < lo-slack || got > hi+slack {
			t.Fatalf("hs %g, hm %g, d %g, f %g: got ΔL %g dB, want within [%g, %g] dB", hs, hm, d, f, got, lo, hi)
		}
		if r.Q < 0 || r.Q > 1 {
			t.Fatalf("hs %g, hm %g, d %g: got Q %g, want in [0, 1]", hs, hm, d, r.Q)
		}
	}
}

func TestPathDifferenceFarApproximation(t *testing.T) {
	// acoustics.md §3.1: Δ ≈ 2·hs·hm/d for d ≫ hs, hm (the table's "approx"
	// column: 0.30000, 0.12000, 0.16000 m, COMPUTED). Δ computed without
	// cancellation keeps relative precision at very large d (hand-derived).
	for _, c := range []struct{ hs, hm, d, approx float64 }{
		{2, 1.5, 20, 0.30000}, {1.5, 1.2, 30, 0.12000}, {3, 1.2, 45, 0.16000},
	} {
		if got := 2 * c.hs * c.hm / c.d; !withinAbs(got, c.approx, printed(5)) {
			t.Errorf("got approximation %g, want %g", got, c.approx)
		}
		if got := FloorReflection(c.hs, c.hm, c.d).PathDifference; !withinRel(got, c.approx, 0.01) {
			t.Errorf("hs %g, hm %g, d %g: got Δ %g m, want within 1 %% of %g m", c.hs, c.hm, c.d, got, c.approx)
		}
	}
	r := FloorReflection(1, 1, 1e7)
	if !withinRel(r.PathDifference, 2e-7, 1e-9) {
		t.Errorf("d = 1e7 m: got Δ %g m, want 2e-7 m", r.PathDifference)
	}
}

func TestFirstNullInBand(t *testing.T) {
	// Nulls of hs = 2, hm = 1.5, d = 20 m at 576.4, 1729.3, 2882.2 Hz
	// (acoustics.md §3.1, COMPUTED).
	r := FloorReflection(2, 1.5, 20)
	n0, n1 := r.NullFrequency(0, cISO), r.NullFrequency(1, cISO)
	tests := []struct {
		name       string
		r          Reflection
		lo, hi     float64
		want       float64
		wantInBand bool
	}{
		{"audio band holds the first null", r, 50, 10e3, n0, true},
		{"band between the first two nulls", r, 600, 1700, n1, false},
		{"band holds the second null", r, 600, 2000, n1, true},
		{"band below the first null", r, 20, 500, n0, false},
		{"band limits are the null itself", r, n1, n1, n1, true},
		{"reversed band", r, 2000, 600, r.NullFrequency(2, cISO), false},
		{"flush microphone", FloorReflection(2, 0, 20), 20, 100e3, math.Inf(1), false},
		{"NaN limit", r, math.NaN(), 100, math.NaN(), false},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			f, in := FirstNullInBand(tt.r, cISO, tt.lo, tt.hi)
			same := f == tt.want || withinRel(f, tt.want, 1e-12) || (math.IsNaN(f) && math.IsNaN(tt.want))
			if !same || in != tt.wantInBand {
				t.Errorf("got %g Hz, %v, want %g Hz, %v", f, in, tt.want, tt.wantInBand)
			}
		})
	}
}

func TestMaxMicHeightForNull(t *testing.T) {
	// Hand-computed: c/(4·fMax·sin ψ) = 343.2/(4·10000·0.5) = 0.01716 m.
	if got := MaxMicHeightForNull(10e3, deg(30), cISO); !withinRel(got, 0.01716, 1e-12) {
		t.Errorf("got %g m, want 0.01716 m", got)
	}
	if got := MaxMicHeightForNull(10e3, 0, cISO); !math.IsInf(got, 1) {
		t.Errorf("grazing incidence: got %g m, want +Inf", got)
	}
	// DERIVED check against the exact image-source model: a distant source
	// seen at elevation ψ from a microphone at the returned height puts the
	// first null at fMax (within 0.1 %).
	for _, c := range []struct{ fMax, psiDeg float64 }{{10e3, 5}, {20e3, 15}, {100e3, 30}, {1e3, 60}} {
		hm := MaxMicHeightForNull(c.fMax, deg(c.psiDeg), cISO)
		const d = 1e4
		hs := hm + d*math.Tan(deg(c.psiDeg))
		f0 := FloorReflection(hs, hm, d).NullFrequency(0, cISO)
		if !withinRel(f0, c.fMax, 1e-3) {
			t.Errorf("fMax %g Hz, ψ %g°: got first null %g Hz at hm = %g m, want %g Hz", c.fMax, c.psiDeg, f0, hm, c.fMax)
		}
	}
}

func TestReflectionPanics(t *testing.T) {
	// Programmer misuse documented to panic.
	r := FloorReflection(2, 1.5, 20)
	for name, call := range map[string]func(){
		"NullFrequency(-1)": func() { r.NullFrequency(-1, cISO) },
		"PeakFrequency(0)":  func() { r.PeakFrequency(0, cISO) },
	} {
		t.Run(name, func(t *testing.T) {
			defer func() {
				if recover() == nil {
					t.Errorf("got no panic, want one")
				}
			}()
			call()
		})
	}
}

func TestFloorReflectionSpecialCases(t *testing.T) {
	// Documented special cases (hand-derived).
	if got := FloorReflection(0, 0, 0); got != (Reflection{Q: 1}) {
		t.Errorf("all zero: got %+v, want {0 0 0 1}", got)
	}
	if got := FloorReflection(1.5, 1.5, 0); got.Direct != 0 || got.Q != 0 || got.PathDifference != 3 {
		t.Errorf("microphone on the source: got %+v, want Direct 0, Q 0, Δ 3", got)
	}
	if got := FloorReflection(math.NaN(), 1, 5); !math.IsNaN(got.PathDifference) || !math.IsNaN(got.Q) {
		t.Errorf("NaN height: got %+v, want NaN Δ and Q", got)
	}
}
