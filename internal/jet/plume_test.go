package jet

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// isothermal returns a jet of velocity uj whose static temperature equals the
// ambient (ρj = ρa), so that D_eff = D as in the published constant-density
// data.
func isothermal(uj float64) Condition {
	g := Air()
	mj := uj / g.SoundSpeed(288.15)
	return Condition{Primary: Stream{NPR: g.PressureRatio(mj), TotalTemperature: 288.15 * g.TemperatureRatio(mj)}, Ambient: StandardAmbient()}
}

// TestFarFieldDecay checks the nominal centreline velocity and half-velocity
// radius in the self-similar region against Hussein, Capp & George 1994
// (B = 5.8, S = 0.094 CONFIRMED secondary via Pope 2000 Table 5.1; x0 = 4 D
// from memory), the reference sheet's §4 check values for D = 1 m,
// Uj = 300 m/s, to half a unit of the last printed digit.
func TestFarFieldDecay(t *testing.T) {
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 1}, isothermal(300), DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	for _, tt := range []struct{ x, uc, rh float64 }{
		{20, 108.75, 1.504}, {30, 66.92, 2.444}, {50, 37.83, 4.324},
	} {
		if got := p.CenterlineVelocity(tt.x); math.Abs(got-tt.uc) > 0.005 {
			t.Errorf("x %g D: got Uc %.3f, want %.2f", tt.x, got, tt.uc)
		}
		if got := p.HalfVelocityRadius(tt.x); math.Abs(got-tt.rh) > 0.0005 {
			t.Errorf("x %g D: got r½ %.4f, want %.3f", tt.x, got, tt.rh)
		}
		// Gaussian profile (Albertson et al. 1950, CONFIRMED): half the
		// centreline value at r½
		if got := p.Velocity(tt.x, p.HalfVelocityRadius(tt.x)) / p.CenterlineVelocity(tt.x); !near(got, 0.5, 1e-12) {
			t.Errorf("x %g D: got u(r½)/Uc %.6f, want 0.5", tt.x, got)
		}
	}
	// the conservative field holds Uj between the end of the core and
	// x0 + B·D (reference sheet §4, "cap Uc at Uj"), then follows the law
	if got := p.cons.uc(9.8); !near(got, 300, 1e-9) {
		t.Errorf("conservative, x 9.8 D: got %.4f, want 300 (cap)", got)
	}
	// the nominal one starts to fall at the end of the potential core,
	// smoothly and monotonically, and meets the law where it gives Uj/2
	lc := p.CoreLength(Nominal)
	prev := 300.0
	for x := lc; x < 20; x += 0.01 {
		u := p.CenterlineVelocity(x)
		if u > prev+1e-9 {
			t.Fatalf("nominal centreline rises at x %g D", x)
		}
		prev = u
	}
	if got := p.CenterlineVelocity(lc + 1); got >= 300 || got < 250 {
		t.Errorf("one diameter past the core: got %.2f m/s, want just below Uj", got)
	}
	if xj := p.nom.x0u + 2*5.8; !near(p.CenterlineVelocity(xj), 150, 1e-9) {
		t.Errorf("at x0 + 2B·D: got %.4f, want Uj/2", p.CenterlineVelocity(xj))
	}
}

// TestVelocityEnvelopeWorkedExample checks the nominal closed 5 m/s contour
// against the reference sheet's §11 worked example (DERIVED from the
// Gaussian model with Hussein, Capp & George 1994 constants; brute-force scan
// in the sheet gives 16.8512 m at 215.1 m): D = 1 m, Uj = 300 m/s.
func TestVelocityEnvelopeWorkedExample(t *testing.T) {
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 1}, isothermal(300), DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	e := p.Envelope(VelocityZone, Nominal)
	if !near(e.Length, 352.0, 1e-6) {
		t.Errorf("length: got %.4f m, want 352.0", e.Length)
	}
	if !near(e.MaxRadius, 16.851, 1e-4) || math.Abs(e.MaxRadiusAt-215.07) > 0.05 {
		t.Errorf("max radius: got %.4f m at %.2f m, want 16.851 at 215.07", e.MaxRadius, e.MaxRadiusAt)
	}
	for _, tt := range []struct{ x, r float64 }{{50, 7.388}, {100, 12.300}, {300, 13.445}} {
		if got := e.Radius(tt.x); !near(got, tt.r, 1e-4) {
			t.Errorf("r_b(%g): got %.4f, want %.3f", tt.x, got, tt.r)
		}
	}
	// the conservative zone is bigger (B 6.2, S 0.10 and a tail factor)
	c := p.Envelope(VelocityZone, Conservative)
	if c.Length <= e.Length || c.MaxRadius <= e.MaxRadius {
		t.Errorf("conservative %g × %g not bigger than nominal %g × %g", c.Length, c.MaxRadius, e.Length, e.MaxRadius)
	}
}

// TestHotJetEnvelope checks the hot variant of the §11 example (Tj = 800 K,
// Uj = 400 m/s, u_min = 10 m/s): a = B·D_eff·Uj/u_min = 139.236 m beyond the
// virtual origin and r_max = 0.51517·S·a = 6.742 m (DERIVED in the reference
// sheet; its x0 = 4 D_eff differs from ours, 4 Dj, which is longer).
func TestHotJetEnvelope(t *testing.T) {
	g := Air()
	mj := 400 / g.SoundSpeed(800)
	c := Condition{Primary: Stream{NPR: g.PressureRatio(mj), TotalTemperature: 800 * g.TemperatureRatio(mj)}, Ambient: StandardAmbient()}
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 1}, c, Limits{Velocity: 10, Temperature: 323.15})
	if err != nil {
		t.Fatal(err)
	}
	if got := p.Exit().EffectiveDiameter; !near(got, 0.6002, 2e-4) {
		t.Errorf("D_eff: got %.4f, want 0.6002", got)
	}
	e := p.Envelope(VelocityZone, Nominal)
	if got := e.Length - 4; !near(got, 139.236, 1e-4) {
		t.Errorf("a: got %.3f, want 139.236", got)
	}
	if !near(e.MaxRadius, 6.742, 2e-4) {
		t.Errorf("r_max: got %.4f, want 6.742", e.MaxRadius)
	}
}

// TestChenRodiDecay checks the variable-density decay laws with Chen &
// Rodi's (1980) constants (B = 6.2 and KT = 5.0 CONFIRMED in Papanikolaou et
// al. 2012 Eqs. 5–6; x0 = 0) against the reference sheet's §5d check values
// for D = 1 m, Uj = 400 m/s, Tj = 800 K. The temperature law meets the end of
// the core continuously, which moves its virtual origin 0.7 D downstream of
// x0 = 0 here (KT·D_eff = 3.0 D is shorter than the 3.7 D heated core); the
// tolerance allows for that shift (7 % at 10 D, 1.5 % at 50 D).
func TestChenRodiDecay(t *testing.T) {
	g := Air()
	mj := 400 / g.SoundSpeed(800)
	c := Condition{Primary: Stream{NPR: g.PressureRatio(mj), TotalTemperature: 800 * g.TemperatureRatio(mj)}, Ambient: StandardAmbient()}
	m := NominalModel()
	m.B, m.KT, m.X0 = 6.2, 5.0, 0
	p, err := NewPlumeWith(Nozzle{Kind: Convergent, Diameter: 1}, c, DefaultLimits(), m, ConservativeModel())
	if err != nil {
		t.Fatal(err)
	}
	dTj := 800 - 288.15
	for _, tt := range []struct{ x, uc, dtc float64 }{{10, 148.84, 153.59}, {30, 49.61, 51.20}, {50, 29.77, 30.72}} {
		if got := p.CenterlineVelocity(tt.x); !near(got, tt.uc, 2e-4) {
			t.Errorf("x %g: got Uc %.3f, want %.2f", tt.x, got, tt.uc)
		}
		shift := p.nom.x0t / (tt.x - p.nom.x0t)
		if got := p.nom.thetac(tt.x) * dTj; !near(got, tt.dtc, shift+2e-4) || got < tt.dtc {
			t.Errorf("x %g: got ΔTc %.3f, want %.2f", tt.x, got, tt.dtc)
		}
	}
}

// randomJet draws a nozzle and operating point over the range the tool
// meets: model to full scale, cold to afterburning, subsonic to Mach 2.
func randomJet(rng *rand.Rand) (Nozzle, Condition) {
	d := 0.01 * math.Pow(200, rng.Float64())
	var n Nozzle
	switch rng.IntN(4) {
	case 0:
		n = Nozzle{Kind: Convergent, Diameter: d}
	case 1:
		n = Nozzle{Kind: ConvergentDivergent, Diameter: d, DesignMach: 1.1 + rng.Float64()}
	case 2:
		n = RectangularFromAspect(d, 1+30*rng.Float64(), 0)
	default:
		n = Nozzle{Kind: Coaxial, Diameter: d, SecondaryDiameter: d * (1.2 + rng.Float64())}
	}
	c := Condition{
		Primary: Stream{NPR: 1 + 0.02 + 6*rng.Float64(), TotalTemperature: 220 + 1300*rng.Float64()},
		Ambient: Ambient{Pressure: 80e3 + 25e3*rng.Float64(), Temperature: 260 + 50*rng.Float64()},
	}
	if n.Kind == Coaxial {
		c.Secondary = &Stream{NPR: 1.02 + 1.5*rng.Float64(), TotalTemperature: 250 + 100*rng.Float64()}
	}
	return n, c
}

// TestEnvelopeContainsField is the safety property of the zones: every
// sampled point where the nominal mean velocity (or temperature) exceeds
// the limit lies inside both the nominal and the conservative envelope, and
// the conservative envelope is never narrower than the nominal one.
func TestEnvelopeContainsField(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for i := 0; i < 300; i++ {
		n, c := randomJet(rng)
		lim := Limits{Velocity: 1 + 20*rng.Float64(), Temperature: c.Ambient.Temperature + 5 + 100*rng.Float64()}
		p, err := NewPlume(n, c, lim)
		if err != nil {
			t.Fatalf("jet %d: %v", i, err)
		}
		for _, z := range []Zone{VelocityZone, HotZone} {
			nom, cons := p.Envelope(z, Nominal), p.Envelope(z, Conservative)
			if cons.Length < nom.Length {
				t.Fatalf("jet %d %v: conservative length %g < nominal %g", i, z, cons.Length, nom.Length)
			}
			for k := 0; k <= 200; k++ {
				x := nom.Length * float64(k) / 200
				if cons.Radius(x) < nom.Radius(x)-1e-12 {
					t.Fatalf("jet %d %v: at x %g conservative radius %g < nominal %g", i, z, x, cons.Radius(x), nom.Radius(x))
				}
			}
		}
		ve, he := p.Envelope(VelocityZone, Nominal), p.Envelope(HotZone, Nominal)
		vc, hc := p.Envelope(VelocityZone, Conservative), p.Envelope(HotZone, Conservative)
		span := 1.2 * math.Max(vc.Length, hc.Length)
		width := 1.2 * math.Max(vc.MaxRadius, hc.MaxRadius)
		for k := 0; k < 2000; k++ {
			x, r := span*rng.Float64(), width*rng.Float64()
			if p.Velocity(x, r) > lim.Velocity*(1+1e-9) {
				if !ve.Contains(x, r) || !vc.Contains(x, r) {
					t.Fatalf("jet %d: u(%g, %g) = %g > %g outside the velocity envelope", i, x, r, p.Velocity(x, r), lim.Velocity)
				}
				if vc.Clearance(x, r) > 0 {
					t.Fatalf("jet %d: positive clearance %g at a point inside", i, vc.Clearance(x, r))
				}
			}
			if p.TotalTemperature(x, r) > lim.Temperature*(1+1e-9) || p.Temperature(x, r) > lim.Temperature*(1+1e-9) {
				if !he.Contains(x, r) || !hc.Contains(x, r) {
					t.Fatalf("jet %d: T0(%g, %g) = %g > %g outside the hot envelope", i, x, r, p.TotalTemperature(x, r), lim.Temperature)
				}
			}
		}
	}
}

// TestClearanceIsSafe checks Clearance against a brute-force distance to
// the exact zone: it never exceeds it (so a clearance can be trusted) and
// is short of it by no more than twice the outline tolerance plus the
// brute-force step.
func TestClearanceIsSafe(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	for i := 0; i < 60; i++ {
		n, c := randomJet(rng)
		p, err := NewPlume(n, c, DefaultLimits())
		if err != nil {
			t.Fatal(err)
		}
		e := p.Envelope(VelocityZone, Conservative)
		if e.Length == 0 {
			continue
		}
		const steps = 20000
		xs := make([]float64, steps+1)
		rs := make([]float64, steps+1)
		for k := range xs {
			xs[k] = e.Length * (1 - math.Cos(math.Pi*float64(k)/steps)) / 2
			rs[k] = e.Radius(xs[k])
		}
		for k := 0; k < 200; k++ {
			x := (1.5*rng.Float64() - 0.2) * e.Length
			r := 1.5 * e.MaxRadius * rng.Float64()
			if e.Contains(x, r) {
				if got := e.Clearance(x, r); got > 0 {
					t.Fatalf("inside point (%g, %g): clearance %g", x, r, got)
				}
				continue
			}
			exact := math.Inf(1)
			for j := range xs {
				// distance to the vertical segment from the axis to the edge at xs[j]
				dr := math.Max(0, r-rs[j])
				exact = math.Min(exact, math.Hypot(x-xs[j], dr))
			}
			got := e.Clearance(x, r)
			step := e.Length * math.Pi / steps
			if got > exact+1e-9 {
				t.Fatalf("jet %d (%g, %g): clearance %g exceeds the exact distance %g", i, x, r, got, exact)
			}
			if got < exact-2*e.Tolerance-step-1e-9 {
				t.Fatalf("jet %d (%g, %g): clearance %g far below the exact %g (tolerance %g)", i, x, r, got, exact, e.Tolerance)
			}
		}
	}
}

// TestZonesGrowWithPower checks that a hotter or faster jet never gives a
// shorter conservative zone.
func TestZonesGrowWithPower(t *testing.T) {
	n := Nozzle{Kind: Convergent, Diameter: 0.05}
	lengths := func(npr, t0 float64) (v, h float64) {
		p, err := NewPlume(n, Condition{Primary: Stream{NPR: npr, TotalTemperature: t0}, Ambient: StandardAmbient()}, DefaultLimits())
		if err != nil {
			t.Fatal(err)
		}
		return p.Envelope(VelocityZone, Conservative).Length, p.Envelope(HotZone, Conservative).Length
	}
	for _, npr := range []float64{1.1, 1.5, 2, 3, 5} {
		pv, ph := 0.0, 0.0
		for t0 := 250.0; t0 <= 1500; t0 += 25 {
			v, h := lengths(npr, t0)
			if v < pv*(1-1e-12) || h < ph*(1-1e-12) {
				t.Errorf("NPR %g T0 %g: hotter jet gives shorter zone: velocity %g after %g, hot %g after %g", npr, t0, v, pv, h, ph)
			}
			pv, ph = v, h
		}
	}
	for _, t0 := range []float64{288.15, 600, 1200} {
		pv, ph := 0.0, 0.0
		for npr := 1.05; npr <= 8; npr += 0.05 {
			v, h := lengths(npr, t0)
			if v < pv*(1-1e-12) || h < ph*(1-1e-12) {
				t.Errorf("T0 %g NPR %g: faster jet gives shorter zone: velocity %g after %g, hot %g after %g", t0, npr, v, pv, h, ph)
			}
			pv, ph = v, h
		}
	}
}

// TestContinuity checks that u(x, r) and T(x, r) have no jump along x,
// in particular through the end of the core and where the far-field law
// takes over.
func TestContinuity(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 6))
	for i := 0; i < 50; i++ {
		n, c := randomJet(rng)
		p, err := NewPlume(n, c, DefaultLimits())
		if err != nil {
			t.Fatal(err)
		}
		uj, dj := p.Exit().Velocity, p.Exit().FullyExpandedDiameter
		dT := math.Abs(p.Exit().TotalTemperature - c.Ambient.Temperature)
		lc := p.CoreLength(Nominal)
		for _, x := range []float64{lc, p.nom.x0u + p.nom.m.B*p.nom.de, p.nom.x0 + p.nom.wc/p.nom.m.S} {
			for _, r := range []float64{0, 0.3 * dj, 0.6 * dj, 1.5 * dj} {
				const h = 1e-7
				du := math.Abs(p.Velocity(x+h*dj, r) - p.Velocity(x-h*dj, r))
				dt := math.Abs(p.TotalTemperature(x+h*dj, r) - p.TotalTemperature(x-h*dj, r))
				if du > 1e-4*uj || dt > 1e-4*dT+1e-9 {
					t.Errorf("jet %d at x %g, r %g: jump of %g m/s, %g K", i, x, r, du, dt)
				}
			}
		}
	}
}

// TestPlumeErrors checks the limits' validation.
func TestPlumeErrors(t *testing.T) {
	n := Nozzle{Kind: Convergent, Diameter: 0.05}
	for _, tt := range []struct {
		name string
		lim  Limits
		want string
	}{
		{"zero velocity limit", Limits{Velocity: 0, Temperature: 323}, "velocity limit must be greater than 0 m/s"},
		{"limit below ambient", Limits{Velocity: 5, Temperature: 280}, "must be above the ambient temperature"},
		{"NaN temperature", Limits{Velocity: 5, Temperature: math.NaN()}, "temperature limit must be a finite number"},
	} {
		t.Run(tt.name, func(t *testing.T) {
			_, err := NewPlume(n, cold(1.5), tt.lim)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("got %v, want it to contain %q", err, tt.want)
			}
		})
	}
}

// TestNoCliffAtTheTip checks that a conservative zone closes toward its
// tip instead of ending at full width, and that its width changes smoothly
// with NPR: the lip-edge construction once ran to the tip of short hot
// zones of under-expanded jets, doubling their width across NPR 2.
func TestNoCliffAtTheTip(t *testing.T) {
	for _, d := range []float64{0.05, 0.9} {
		for _, t0 := range []float64{300, 600, 900, 1200} {
			prev := map[Zone]float64{}
			for npr := 1.5; npr <= 3.0; npr += 0.01 {
				c := Condition{Primary: Stream{NPR: npr, TotalTemperature: t0}, Ambient: StandardAmbient()}
				p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: d}, c, DefaultLimits())
				if err != nil {
					t.Fatal(err)
				}
				for _, z := range []Zone{VelocityZone, HotZone} {
					e := p.Envelope(z, Conservative)
					if e.Length == 0 {
						continue
					}
					if r := e.Radius(0.98 * e.Length); r > 0.6*e.MaxRadius {
						t.Fatalf("D %g T0 %g NPR %.2f %v: radius %.3g at 98 %% of the length, widest %.3g: a cliff at the tip", d, t0, npr, z, r, e.MaxRadius)
					}
					if q := prev[z]; q > 0 && math.Abs(e.MaxRadius/q-1) > 0.05 {
						t.Fatalf("D %g T0 %g NPR %.2f %v: widest radius jumps from %.4g to %.4g", d, t0, npr, z, q, e.MaxRadius)
					}
					prev[z] = e.MaxRadius
				}
			}
		}
	}
}

// TestSlotExitInsideZone checks that a rectangular slot's exit section is
// inside its zones: a short hot zone once capped the lip edge below the
// slot's half-diagonal (found in review).
func TestSlotExitInsideZone(t *testing.T) {
	for _, ar := range []float64{4, 10, 30} {
		n := RectangularFromAspect(0.1, ar, 0)
		c := Condition{Primary: Stream{NPR: 1.05, TotalTemperature: 340}, Ambient: StandardAmbient()}
		p, err := NewPlume(n, c, DefaultLimits())
		if err != nil {
			t.Fatal(err)
		}
		half := math.Hypot(n.Width/2, n.Height/2)
		for _, z := range []Zone{VelocityZone, HotZone} {
			e := p.Envelope(z, Conservative)
			if e.Length == 0 {
				continue
			}
			if got := e.Clearance(0.001*n.Width, half); got > 0 {
				t.Errorf("AR %g %v: corner of the exit has clearance %.4g m, want ≤ 0", ar, z, got)
			}
		}
	}
}

// TestClearanceNeverPositiveInsideOutline checks that a point inside the
// outline polygon, even where a chord bulges out of the exact zone, is
// given no positive clearance, and that the outline's tolerance covers the
// corner where the lip edge meets its cap (both found in review).
func TestClearanceNeverPositiveInsideOutline(t *testing.T) {
	n := RectangularFromAspect(0.1, 4, 0)
	p, err := NewPlume(n, cold(3), Limits{Velocity: 1, Temperature: 323.15})
	if err != nil {
		t.Fatal(err)
	}
	e := p.Envelope(VelocityZone, Conservative)
	for k := 0; k <= 20000; k++ {
		x := e.Length * float64(k) / 20000
		r := e.Radius(x)
		if c := e.Clearance(x, r+1e-4); c > 1e-4 {
			t.Fatalf("x %.4g: a point 0.1 mm outside the zone has clearance %.4g m (tolerance %.4g)", x, c, e.Tolerance)
		}
		if c := e.Clearance(x, 0.5*r); c > 0 {
			t.Fatalf("x %.4g: a point inside has clearance %.4g m", x, c)
		}
	}
}
