package acoustics

import (
	"math"
	"strings"
	"testing"
)

// ambient15 is 15 °C, 70 %, 101.325 kPa.
var ambient15 = Atmosphere{Temperature: 288.15, RelativeHumidity: 70, Pressure: 101325}

// coldJet returns an unheated convergent-nozzle air jet of fully expanded
// Mach number mj and diameter d (m) in ambient15 (hand-computed isentropic
// relations, γ = 1.4, R = 287.05 J/(kg K)).
func coldJet(mj, d float64) Jet {
	ta := ambient15.Temperature
	tj := ta / (1 + 0.2*mj*mj)
	return Jet{Velocity: mj * math.Sqrt(1.4*287.05*tj), Density: 101325 / (287.05 * tj), Diameter: d,
		TotalTemperature: ta, Mach: mj, DesignMach: 1, ShockFree: mj <= 1}
}

// isothermalJet returns a jet of the ambient density with Uj/c0 = vr.
func isothermalJet(vr, d float64) Jet {
	c0 := ambient15.SpeedOfSound()
	return Jet{Velocity: vr * c0, Density: ambient15.Density(), Diameter: d, TotalTemperature: ambient15.Temperature,
		Mach: vr, DesignMach: 1, ShockFree: true}
}

func mustSource(t *testing.T, j Jet) *NoiseSource {
	t.Helper()
	s, err := NewNoiseSource(j, ambient15, NoiseBands(j))
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func mustAt(t *testing.T, s *NoiseSource, p Path) Levels {
	t.Helper()
	l, err := s.At(p, nil)
	if err != nil {
		t.Fatal(err)
	}
	return l
}

// peakOASPL returns the loudest OASPL over polar angles 0–180° in 1° steps
// and its angle in degrees from the jet axis.
func peakOASPL(t *testing.T, s *NoiseSource, r float64) (level, angle float64) {
	level = math.Inf(-1)
	for k := 0; k <= 180; k++ {
		l := mustAt(t, s, Path{Distance: r, Polar: deg(float64(k)), Lossless: true})
		if l.OASPL > level {
			level, angle = l.OASPL, float64(k)
		}
	}
	return level, angle
}

func TestARP876WorkedValues(t *testing.T) {
	// noise-and-exposure.md §1, DERIVED from the ARP 876 tables: cold Mj 0.9,
	// D = 50.8 mm, r = 100 D: L_W ≈ 121 dB, OASPL ≈ 93 dB at 90° and
	// ≈ 102 dB at the aft peak; hot Vj 600 m/s, 800 K, D = 1 m, r = 45 m:
	// L_W ≈ 169 dB, ≈ 117 dB at 90°, ≈ 133 dB at the peak. The sheet's
	// values are rounded to 1 dB; the hot case is read with 800 K as the
	// static jet temperature (ρj = p/(R·800 K)). Tolerance 1 dB.
	hot := Jet{Velocity: 600, Density: 101325 / (287.05 * 800), Diameter: 1, TotalTemperature: 800 + 600*600/(2*1004.7),
		Mach: 600 / math.Sqrt(1.4*287.05*800), DesignMach: 600 / math.Sqrt(1.4*287.05*800), ShockFree: true}
	tests := []struct {
		name         string
		jet          Jet
		r            float64
		lw, l90, lpk float64
	}{
		{"cold Mj 0.9, 50.8 mm, 100 D", coldJet(0.9, 0.0508), 5.08, 121, 93, 102},
		{"hot 600 m/s, 800 K, 1 m, 45 m", hot, 45, 169, 117, 133},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			s := mustSource(t, tt.jet)
			w, _ := s.SoundPower()
			if lw := 10 * math.Log10(w/ReferenceSoundPower); !withinAbs(lw, tt.lw, 1) {
				t.Errorf("got L_W = %.1f dB, want %.0f dB ± 1", lw, tt.lw)
			}
			if l := mustAt(t, s, Path{Distance: tt.r, Polar: deg(90), Lossless: true}); !withinAbs(l.OASPL, tt.l90, 1) {
				t.Errorf("got OASPL at 90° = %.1f dB, want %.0f dB ± 1", l.OASPL, tt.l90)
			}
			if pk, _ := peakOASPL(t, s, tt.r); !withinAbs(pk, tt.lpk, 1) {
				t.Errorf("got peak OASPL = %.1f dB, want %.0f dB ± 1", pk, tt.lpk)
			}
		})
	}
}

func TestLighthillVelocityExponent(t *testing.T) {
	// Lighthill's eighth-power law (Lighthill 1952, Proc. R. Soc. A 211;
	// CONFIRMED, acoustics.md §6.1): at 90° the OASPL of an isothermal jet
	// grows as Uj^n with n between 6 and 9 over Uj/c0 = 0.5–1 (the range
	// the issue asks; from memory).
	for _, span := range [][2]float64{{0.5, 0.7}, {0.7, 0.85}, {0.85, 1}, {0.5, 1}} {
		lo := mustAt(t, mustSource(t, isothermalJet(span[0], 0.05)), Path{Distance: 5, Polar: deg(90), Lossless: true})
		hi := mustAt(t, mustSource(t, isothermalJet(span[1], 0.05)), Path{Distance: 5, Polar: deg(90), Lossless: true})
		n := (hi.OASPL - lo.OASPL) / (10 * math.Log10(span[1]/span[0]))
		if n < 6 || n > 9 {
			t.Errorf("Uj/c0 %.2f–%.2f: got velocity exponent %.2f, want 6–9", span[0], span[1], n)
		}
	}
}

func TestPeakAngleAft(t *testing.T) {
	// Peak OASPL of subsonic jets lies aft. Sources: acoustics.md §6.2
	// (FROM MEMORY, high): about 25–35° from the downstream axis, moving
	// outward as the convective Mach number rises; Morris, Richarz & Ribner
	// 1973, J. Sound Vib. 29(4) 443–455 (READ, abstract): the directivity of
	// a subsonic jet peaks between 15° and 45° from the jet axis. The issue
	// asks 30–50°, which the ARP 876 directivity table (READ in MIT-LAE/pyNA,
	// directivity_function.csv) meets for high-subsonic jets. Below
	// Uj/c0 ≈ 0.9 the table's largest entries are in its 160–180° rows
	// (θj 0–20°): its peak moves toward the axis, the trend of §6.2, and its
	// aft lobe is flat within 1.5 dB from 0° to 30° — inside the ±5 dB this
	// package states within 30° of the axis (Uncertainty). So: 30–50° where
	// the table peaks there; at lower speeds an aft lobe, its maximum within
	// 45° of the axis, the 30–50° arc within 1.5 dB of it and at least 5 dB
	// above 90°, and a peak that never moves outward as the speed falls.
	type result struct{ vr, peak, angle, arc, at90 float64 }
	var rs []result
	for _, vr := range []float64{0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 1.0} {
		s := mustSource(t, isothermalJet(vr, 0.05))
		peak, angle := peakOASPL(t, s, 5)
		arc := math.Inf(-1)
		for a := 30; a <= 50; a++ {
			arc = math.Max(arc, mustAt(t, s, Path{Distance: 5, Polar: deg(float64(a)), Lossless: true}).OASPL)
		}
		at90 := mustAt(t, s, Path{Distance: 5, Polar: deg(90), Lossless: true}).OASPL
		rs = append(rs, result{vr, peak, angle, arc, at90})
	}
	for i, r := range rs {
		if r.vr >= 0.9 && (r.angle < 30 || r.angle > 50) {
			t.Errorf("Uj/c0 = %.2f: got the peak at %.0f° from the jet axis, want 30–50°", r.vr, r.angle)
		}
		if r.angle > 45 {
			t.Errorf("Uj/c0 = %.2f: got the peak at %.0f°, want aft, within 45° of the axis", r.vr, r.angle)
		}
		if r.peak-r.arc > 1.5 {
			t.Errorf("Uj/c0 = %.2f: the 30–50° arc is %.1f dB below the peak, want within 1.5 dB", r.vr, r.peak-r.arc)
		}
		if r.arc-r.at90 < 5 {
			t.Errorf("Uj/c0 = %.2f: the 30–50° arc is only %.1f dB above 90°, want an aft lobe of at least 5 dB", r.vr, r.arc-r.at90)
		}
		if i > 0 && r.angle < rs[i-1].angle {
			t.Errorf("Uj/c0 %.2f → %.2f: the peak moved toward the axis (%.0f° → %.0f°) as the speed rose", rs[i-1].vr, r.vr, rs[i-1].angle, r.angle)
		}
	}
}

func TestInverseSquare(t *testing.T) {
	// Inverse-square spreading: −20·log10(2) = −6.02 dB per doubling of
	// distance in a free field without absorption (acoustics.md §0, COMPUTED).
	s := mustSource(t, coldJet(0.9, 0.0508))
	for _, th := range []float64{30, 90, 150} {
		a := mustAt(t, s, Path{Distance: 5, Polar: deg(th), Lossless: true})
		b := mustAt(t, s, Path{Distance: 10, Polar: deg(th), Lossless: true})
		if d := a.OASPL - b.OASPL; !withinAbs(d, 20*math.Log10(2), 1e-9) {
			t.Errorf("%g°: got %.6f dB per doubling, want 6.0206", th, d)
		}
		if c := mustAt(t, s, Path{Distance: 10, Polar: deg(th)}); c.OASPL > b.OASPL {
			t.Errorf("%g°: air absorption raised the level: %.2f > %.2f dB", th, c.OASPL, b.OASPL)
		}
	}
}

func TestFloorImage(t *testing.T) {
	// Image source over a rigid floor (acoustics.md §3.1–3.2, FROM MEMORY,
	// high): a flush microphone (Δ = 0) reads +20·log10 2 = +6.02 dB at all
	// frequencies; far from the floor's coherent limit the band-averaged sum
	// tends to the energy sum, +3.01 dB for equal paths (hand-computed).
	s := mustSource(t, coldJet(0.9, 0.0508))
	free := mustAt(t, s, Path{Distance: 5, Polar: deg(90), Lossless: true})
	flush := mustAt(t, s, Path{Distance: 5, Polar: deg(90), ImageDistance: 5, ImagePolar: deg(90), Lossless: true})
	if d := flush.OASPL - free.OASPL; !withinAbs(d, 20*math.Log10(2), 1e-9) {
		t.Errorf("flush: got %+.4f dB, want +6.0206", d)
	}
	// Δ = 1 m: many wavelengths at every band of a model jet
	far := mustAt(t, s, Path{Distance: 5, Polar: deg(90), ImageDistance: 6, ImagePolar: deg(90), Lossless: true})
	want := 10 * math.Log10(1+25.0/36)
	if d := far.OASPL - free.OASPL; !withinAbs(d, want, 0.3) {
		t.Errorf("Δ = 1 m: got %+.2f dB, want the energy sum %+.2f dB ± 0.3", d, want)
	}
}

// TestSoftFloorImage checks the image over soft ground (grass): each band
// takes the larger of the rigid floor's band-averaged coherent sum and the
// energy sum of the direct and image paths (incoherent image, +3 dB for
// equal paths; acoustics.md §3.1, FROM MEMORY, high, for both sums): real
// ground is nearly rigid at low frequencies, so leaving the image out
// would read up to 6 dB low, and taking the energy sum at least is
// conservative where the ground's impedance is not modelled. So no band is
// below the energy sum nor above the +6.02 dB of pressure doubling, and a
// band where the rigid sum is larger reads the rigid sum.
func TestSoftFloorImage(t *testing.T) {
	s := mustSource(t, coldJet(0.9, 0.0508))
	n := len(s.Bands())
	free, rigid, soft := make([]float64, n), make([]float64, n), make([]float64, n)
	// source 1 m and microphone 1 m up, 5 m apart: Δ = 0.385 m, the first
	// null near 450 Hz (acoustics.md §3.1 table, COMPUTED)
	r1, r2 := 5.0, math.Hypot(5, 2)
	mustBands := func(p Path, b []float64) Levels {
		l, err := s.At(p, b)
		if err != nil {
			t.Fatal(err)
		}
		return l
	}
	lf := mustBands(Path{Distance: r1, Polar: deg(90), Lossless: true}, free)
	mustBands(Path{Distance: r1, Polar: deg(90), ImageDistance: r2, ImagePolar: deg(90), Lossless: true}, rigid)
	ls := mustBands(Path{Distance: r1, Polar: deg(90), ImageDistance: r2, ImagePolar: deg(90), Lossless: true, SoftFloor: true}, soft)
	energy := 10 * math.Log10(1+r1*r1/(r2*r2)) // equal directivity at both paths
	for b := range free {
		d := soft[b] - free[b]
		if d < energy-1e-9 || d > 20*math.Log10(2)+1e-9 {
			t.Errorf("band %s: soft floor adds %+.2f dB, want from the energy sum %+.2f dB to +6.02 dB", s.Bands()[b].Nominal, d, energy)
		}
		if rigid[b] > soft[b]+1e-9 {
			t.Errorf("band %s: soft %.2f dB below the rigid sum %.2f dB", s.Bands()[b].Nominal, soft[b], rigid[b])
		}
	}
	if d := ls.OASPL - lf.OASPL; d < energy-1e-9 {
		t.Errorf("OASPL: soft floor adds %+.2f dB, want at least the energy sum %+.2f dB", d, energy)
	}
}

func TestReverberantField(t *testing.T) {
	// Hard-walled room: Lp = L_W + 10·log10(Q/(4π r²) + 4/R) (noise-and-
	// exposure.md §4, FROM MEMORY, textbook). Far from the source the
	// reverberant term dominates: Lp → L_W + 10·log10(4/R) + 10·log10(ρ0c0/400)
	// when L_W is referred to 1 pW and Lp to 20 µPa (hand-computed; ρ0c0 in rayl).
	s := mustSource(t, coldJet(0.9, 0.0508))
	w, _ := s.SoundPower()
	lw := 10 * math.Log10(w/ReferenceSoundPower)
	const rc = 20.0 // m²
	l := mustAt(t, s, Path{Distance: 1e4, Polar: deg(90), RoomConstant: rc, Lossless: true})
	rhoc := ambient15.Density() * ambient15.SpeedOfSound()
	want := lw + 10*math.Log10(4/rc) + 10*math.Log10(rhoc/400)
	if !withinAbs(l.OASPL, want, 0.01) {
		t.Errorf("got %.3f dB, want %.3f dB", l.OASPL, want)
	}
	// room constant from Eyring's T60 = 0.161·V/(−S·ln(1 − ᾱ)) (Eyring 1930,
	// J. Acoust. Soc. Am. 1, FROM MEMORY, textbook): a 10×8×5 m room
	// (V = 400 m³, S = 340 m²) with T60 = 1 s has
	// ᾱ = 1 − exp(−0.161·400/340) = 0.17255 (hand-computed; Sabine's
	// 0.161·V/(S·T60) gives 0.18941)
	a := EyringAbsorption(400, 340, 1)
	if !withinAbs(a, 0.17255, 5e-6) {
		t.Errorf("got ᾱ = %.5f, want 0.17255", a)
	}
	if r := RoomConstant(340, a); !withinAbs(r, 340*a/(1-a), 1e-9) {
		t.Errorf("got R = %.3f m², want %.3f", r, 340*a/(1-a))
	}
}

// TestEyringAbsorption checks Eyring's ᾱ against hand-computed values
// (DERIVED from ᾱ = 1 − exp(−0.161·V/(S·T60)), Eyring 1930, FROM MEMORY):
// it stays below 1 however short the time, where Sabine's passes 1, and
// it meets Sabine's in a live room.
func TestEyringAbsorption(t *testing.T) {
	tests := []struct {
		name         string
		v, s, t60    float64
		want, sabine float64
	}{
		// V/S = 1.2258 m: Sabine 0.161·1.2258/0.15 = 1.3157 (> 1)
		{"dead room", 500, 407.9, 0.15, 0.73170, 1.31566},
		// the reviewer's room: Sabine ᾱ 0.716, Eyring 0.511 (DERIVED: same V/S)
		{"short time", 0.716 * 0.15 / 0.161, 1, 0.15, 0.51131, 0.716},
		{"live room", 400, 340, 10, 0.018763, 0.018941},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := EyringAbsorption(tt.v, tt.s, tt.t60)
			if !withinAbs(got, tt.want, 5e-5) || !(got < 1) {
				t.Errorf("got ᾱ = %.5f, want %.5f (Sabine's would be %.5f)", got, tt.want, tt.sabine)
			}
		})
	}
	if a := EyringAbsorption(400, 340, 1e-6); !(a <= 1) {
		t.Errorf("1 µs: got ᾱ = %g, want at most 1", a)
	}
}

func TestShockNoise(t *testing.T) {
	// Harper-Bourne & Fisher (1973): shock-associated intensity ∝ β⁴ for
	// β ≤ 1 (noise-and-exposure.md §3, FROM MEMORY): doubling β from 0.4 to
	// 0.8 adds 40·log10 2 = 12.04 dB to the shock noise power (hand-computed).
	const d = 0.0508
	area := math.Pi * d * d / 4
	power := func(beta float64) float64 {
		bands := NoiseBands(coldJet(1.2, d))
		row := make([]float64, len(bands))
		newShockSpectrum(coldJet(1.2, d), area, beta, ambient15.Density(), ambient15.SpeedOfSound(), 1, bands).add(row, deg(90))
		sum := 0.0
		for _, v := range row {
			sum += v
		}
		return sum
	}
	if g := 10 * math.Log10(power(0.8)/power(0.4)); !withinAbs(g, 40*math.Log10(2), 0.3) {
		t.Errorf("got %.2f dB from doubling β, want 12.04 ± 0.3 (the band peaks move)", g)
	}
	// Peak frequency at 90°: f_p = u_c/L_s with u_c = 0.7 Vj and
	// L_s = 1.1·β·Dj (noise-and-exposure.md §3 and jet.md §8, FROM MEMORY);
	// acoustics.md §6.5 computes 4.79 kHz for Mj 1.5, cold, 50.8 mm. The
	// ARP 876 σ of the H peak must agree within 15 %.
	j := coldJet(1.5, d)
	beta := ShockParameter(1.5, 1)
	fp := ShockPeakFrequency(j.Velocity, math.Pi*j.Diameter*j.Diameter/4, beta, ambient15.SpeedOfSound(), deg(90))
	if !withinRel(fp, 4.79e3, 0.15) {
		t.Errorf("got the shock peak at %.0f Hz, want 4.79 kHz ± 15 %%", fp)
	}
	// shock-free jets carry none
	if s := mustSource(t, coldJet(0.9, d)); s.ShockParameter() != 0 || s.ShockPeak() != 0 {
		t.Errorf("subsonic jet: got β = %g, peak %g Hz, want 0", s.ShockParameter(), s.ShockPeak())
	}
}

func TestWeightings(t *testing.T) {
	// IEC 61672-1 A and C weightings at exact base-ten midbands, to the
	// printed 0.1 dB (CONFIRMED: https://lichtbeeldgeluid.nl/geluid/tabellen/;
	// noise-and-exposure.md §2 gives −1.1 dB at 10 kHz FROM MEMORY, but the
	// table has −1.1 dB at 8 kHz and −2.5 dB at 10 kHz).
	tests := []struct {
		n    int
		a, c float64
	}{
		{15, -39.4, -3.0}, // 31.5 Hz
		{17, -30.2, -1.3}, // 50 Hz
		{20, -19.1, -0.3}, // 100 Hz
		{26, -4.8, 0.0},   // 400 Hz
		{30, 0.0, 0.0},    // 1 kHz
		{33, 1.2, -0.2},   // 2 kHz
		{36, 1.0, -0.8},   // 4 kHz
		{39, -1.1, -3.0},  // 8 kHz
		{40, -2.5, -4.4},  // 10 kHz
		{43, -9.3, -11.2}, // 20 kHz
	}
	for _, tt := range tests {
		f := NewBand(tt.n).Centre
		if a := AWeighting(f); !withinAbs(a, tt.a, printed(1)) {
			t.Errorf("A(%.4g Hz): got %.2f dB, want %.1f", f, a, tt.a)
		}
		if c := CWeighting(f); !withinAbs(c, tt.c, printed(1)) {
			t.Errorf("C(%.4g Hz): got %.2f dB, want %.1f", f, c, tt.c)
		}
	}
	if !math.IsNaN(AWeighting(-1)) || !math.IsInf(CWeighting(0), -1) {
		t.Error("special cases: want NaN below 0 Hz and −Inf at 0 Hz")
	}
}

func TestTamSpectraPeak(t *testing.T) {
	// Tam, Golebiowski & Seiner (1996): both similarity spectra are 0 dB at
	// their peak and lower elsewhere (READ, noise-and-exposure.md §2).
	for _, fn := range []struct {
		name string
		f    func(float64) float64
	}{{"F", LargeScaleSpectrum}, {"G", FineScaleSpectrum}} {
		if v := fn.f(1); !withinAbs(v, 0, 1e-12) {
			t.Errorf("%s(1) = %g dB, want 0", fn.name, v)
		}
		prev := fn.f(0.01)
		for x := 0.01; x < 100; x *= 1.01 {
			v := fn.f(x)
			if v > 0.01 { // the published fit overshoots by 0.006 dB just above x = 1
				t.Errorf("%s(%.3g) = %.3f dB, want ≤ 0.01", fn.name, x, v)
			}
			if math.Abs(v-prev) > 0.5 {
				t.Errorf("%s jumps by %.2f dB near %.3g: the pieces do not join", fn.name, v-prev, x)
			}
			prev = v
		}
	}
}

func TestPeakEstimate(t *testing.T) {
	// C-weighted peak = L_C + crest factor: 12 dB for subsonic jets (the top
	// of +11–12 dB, noise-and-exposure.md §4, FROM MEMORY), 15 dB otherwise
	// (SUGGESTION).
	sub := mustAt(t, mustSource(t, coldJet(0.9, 0.05)), Path{Distance: 5, Polar: deg(60)})
	if d := sub.Peak - sub.CWeighted; d != SubsonicCrestFactor {
		t.Errorf("subsonic: got crest %.1f dB, want 12", d)
	}
	sup := mustAt(t, mustSource(t, coldJet(1.4, 0.05)), Path{Distance: 5, Polar: deg(60)})
	if d := sup.Peak - sup.CWeighted; d != SupersonicCrestFactor {
		t.Errorf("shock-containing: got crest %.1f dB, want 15", d)
	}
	if sup.Uncertainty <= sub.Uncertainty {
		t.Errorf("got uncertainty %.0f dB with shocks, %.0f dB without: want wider with shocks", sup.Uncertainty, sub.Uncertainty)
	}
}

func TestNoiseBadInput(t *testing.T) {
	bad := coldJet(0.9, 0.05)
	bad.Velocity = math.NaN()
	if _, err := NewNoiseSource(bad, ambient15, NoiseBands(coldJet(0.9, 0.05))); err == nil {
		t.Error("NaN velocity: got no error")
	}
	s := mustSource(t, coldJet(0.9, 0.05))
	for _, p := range []Path{{Distance: 0}, {Distance: math.Inf(1)}, {Distance: 1, Polar: math.NaN()}, {Distance: 1, RoomConstant: -1}} {
		if _, err := s.At(p, nil); err == nil {
			t.Errorf("%+v: got no error", p)
		}
	}
}

func FuzzNoise(f *testing.F) {
	f.Add(300.0, 1.2, 0.05, 300.0, 0.9, 1.0, true, 5.0, 1.0, 0.0, 0.0)
	f.Add(600.0, 0.5, 1.0, 900.0, 1.5, 1.0, false, 45.0, 2.5, 46.0, 30.0)
	f.Add(1e-3, 1e3, 1e-6, 5000.0, 3.0, 2.0, false, 1e-3, 3.1, 0.0, 1e-9)
	f.Fuzz(func(t *testing.T, v, rho, d, tt, mj, md float64, free bool, r, th, r2, rc float64) {
		j := Jet{Velocity: v, Density: rho, Diameter: d, TotalTemperature: tt, Mach: mj, DesignMach: md, ShockFree: free}
		bands := NoiseBands(j)
		if len(bands) > 200 {
			bands = bands[:200]
		}
		s, err := NewNoiseSource(j, ambient15, bands)
		if err != nil {
			return
		}
		l, err := s.At(Path{Distance: r, Polar: th, ImageDistance: r2, ImagePolar: th, RoomConstant: rc}, make([]float64, len(bands)))
		if err != nil {
			return
		}
		for _, x := range []float64{l.OASPL, l.AWeighted, l.CWeighted, l.Peak, l.Uncertainty} {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				t.Fatalf("%+v at r %g: got a non-finite level %+v", j, r, l)
			}
		}
		if l.AWeighted > l.OASPL+1.3 || l.CWeighted > l.OASPL+1e-9 {
			t.Fatalf("weighted levels above OASPL by more than the weightings' gain: %+v", l)
		}
	})
}

// TestLevelFallsWithDistance is a property test: in a free field, with or
// without air absorption, every level falls as the receiver moves away
// along a ray, over jets from model to full scale (inverse-square
// spreading, acoustics.md §0; absorption only adds loss).
func TestLevelFallsWithDistance(t *testing.T) {
	for _, j := range []Jet{coldJet(0.5, 0.0254), coldJet(0.9, 0.0508), coldJet(1.5, 0.0508), isothermalJet(0.7, 1)} {
		s := mustSource(t, j)
		for _, th := range []float64{10, 45, 90, 135, 170} {
			prev := Levels{OASPL: math.Inf(1), AWeighted: math.Inf(1), CWeighted: math.Inf(1), Peak: math.Inf(1)}
			for r := 0.5; r < 500; r *= 1.5 {
				l := mustAt(t, s, Path{Distance: r, Polar: deg(th)})
				if !(l.OASPL < prev.OASPL && l.AWeighted < prev.AWeighted && l.CWeighted < prev.CWeighted && l.Peak < prev.Peak) {
					t.Fatalf("Uj %.0f m/s, %g°: level rose from %+v to %+v at %.3g m", j.Velocity, th, prev, l, r)
				}
				prev = l
			}
		}
	}
}

// TestTableTemperatureRange checks that a jet whose total temperature is
// below the ambient (Tt/T0 < 1) is flagged outside the ARP 876 tables,
// which run over Tt/T0 from 1 to 3.5 (noise-and-exposure.md §1, READ): its
// uncertainty widens by the out-of-range allowance and a note says why,
// like a jet above 3.5.
func TestTableTemperatureRange(t *testing.T) {
	in := mustSource(t, isothermalJet(0.8, 0.05))
	base := in.Uncertainty(math.Pi / 2)
	for _, tt := range []struct {
		name  string
		ratio float64
		out   bool
	}{{"ambient", 1, false}, {"hot", 3, false}, {"below ambient", 0.8, true}, {"above the tables", 3.6, true}} {
		t.Run(tt.name, func(t *testing.T) {
			j := isothermalJet(0.8, 0.05)
			j.TotalTemperature = tt.ratio * ambient15.Temperature
			s := mustSource(t, j)
			want := base
			if tt.out {
				want += rangeUncertainty
			}
			if got := s.Uncertainty(math.Pi / 2); got != want {
				t.Errorf("Tt/T0 %g: got ±%g dB, want ±%g dB", tt.ratio, got, want)
			}
			noted := strings.Contains(strings.Join(s.Notes(), " "), "Tt/T0")
			if noted != tt.out {
				t.Errorf("Tt/T0 %g: notes %q, want a note on the temperature ratio: %v", tt.ratio, s.Notes(), tt.out)
			}
		})
	}
}
