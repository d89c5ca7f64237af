package jet

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// rk4 integrates y' = f(t, y) from t0 to t1 in n steps.
func rk4(f func(t float64, y []float64) []float64, y0 []float64, t0, t1 float64, n int, each func(t float64, y []float64)) {
	h := (t1 - t0) / float64(n)
	y := append([]float64(nil), y0...)
	tmp := make([]float64, len(y))
	each(t0, y)
	for i := 0; i < n; i++ {
		t := t0 + float64(i)*h
		k1 := f(t, y)
		for j := range y {
			tmp[j] = y[j] + h/2*k1[j]
		}
		k2 := f(t+h/2, tmp)
		for j := range y {
			tmp[j] = y[j] + h/2*k2[j]
		}
		k3 := f(t+h/2, tmp)
		for j := range y {
			tmp[j] = y[j] + h*k3[j]
		}
		k4 := f(t+h, tmp)
		for j := range y {
			y[j] += h / 6 * (k1[j] + 2*k2[j] + 2*k3[j] + k4[j])
		}
		each(t+h, y)
	}
}

// TestBickleyAgainstODE solves the plane laminar jet's similarity equation
// f”' + f·f” + f'² = 0, f(0) = 0, f'(0) = 1, f”(0) = 0 (boundary-layer
// equations with ψ = 3νB·x^(1/3)·f(η), η = B·y/x^(2/3), derived) by RK4 and
// checks that PlaneLaminarJet's profile is its solution: u/um = f'(η) with
// η = √2·ξ (Bickley 1937; closed form sech², CONFIRMED on public pages).
func TestBickleyAgainstODE(t *testing.T) {
	j := PlaneLaminarJet{K: 2.5, Nu: 1.5e-5}
	x := 0.3
	um := j.Centerline(x)
	worst := 0.0
	rk4(func(_ float64, y []float64) []float64 {
		return []float64{y[1], y[2], -y[0]*y[2] - y[1]*y[1]}
	}, []float64{0, 1, 0}, 0, 8, 8000, func(eta float64, y []float64) {
		// y = ξ/ that maps to this η
		yy := eta / math.Sqrt2 / j.Xi(x, 1)
		worst = math.Max(worst, math.Abs(j.Velocity(x, yy)/um-y[1]))
	})
	if worst > 1e-9 {
		t.Errorf("sech² profile departs from the ODE solution by %g", worst)
	}
	// the momentum flux per span returns K (numerical quadrature)
	k := 2 * quad.Fixed(func(y float64) float64 { u := j.Velocity(x, y); return u * u }, 0, 50*j.HalfWidth(x), 4000, nil, 0)
	if !near(k, j.K, 1e-6) {
		t.Errorf("∫u²dy: got %g, want K = %g", k, j.K)
	}
	// half width: u = um/2 at y½ = 3.2031·(ν²x²/K)^(1/3) (reference sheet §10, DERIVED)
	yh := 3.2031 * math.Cbrt(j.Nu*j.Nu*x*x/j.K)
	if !near(j.HalfWidth(x), yh, 1e-4) || !near(j.Velocity(x, j.HalfWidth(x))/um, 0.5, 1e-12) {
		t.Errorf("half width: got %g, want %g", j.HalfWidth(x), yh)
	}
	// slot check values (reference sheet §10, DERIVED): Re = 30 and 100 at x = 10 b0
	for _, tt := range []struct{ re, um, yh float64 }{{30, 0.6552, 1.5399}, {100, 0.9787, 0.6901}} {
		b0, u0 := 0.01, 1.0
		nu := u0 * b0 / tt.re
		s := PlaneLaminarJet{K: u0 * u0 * b0, Nu: nu}
		if got := s.Centerline(10*b0) / u0; !near(got, tt.um, 2e-4) {
			t.Errorf("Re %g: got um/U0 %.4f, want %.4f", tt.re, got, tt.um)
		}
		if got := s.HalfWidth(10*b0) / b0; !near(got, tt.yh, 2e-4) {
			t.Errorf("Re %g: got y½/b0 %.4f, want %.4f", tt.re, got, tt.yh)
		}
	}
}

// TestSchlichtingAgainstODE solves the round laminar jet's similarity
// equation F·F' = F' − η·F” (boundary-layer equations with ψ = ν·x·F(η),
// η = r/x, integrated once; derived), written for G = F'/η as F' = η·G,
// G' = −(F/η)·G with F(0) = 0, G(0) = 2γ², and checks that
// RoundLaminarJet's profile is its solution (Schlichting 1933, closed form
// (1 + ξ²/4)^(−2) from memory, citation CONFIRMED).
func TestSchlichtingAgainstODE(t *testing.T) {
	j := RoundLaminarJet{K: 0.02, Nu: 1.5e-5}
	x := 0.5
	gamma := j.Xi(x, 1) * x // ξ = γ·η with η = r/x
	um := j.Centerline(x)
	worst := 0.0
	rk4(func(eta float64, y []float64) []float64 {
		fOverEta := 0.0
		if eta > 0 {
			fOverEta = y[0] / eta
		}
		return []float64{eta * y[1], -fOverEta * y[1]}
	}, []float64{0, 2 * gamma * gamma}, 0, 40/gamma, 20000, func(eta float64, y []float64) {
		worst = math.Max(worst, math.Abs(j.Velocity(x, eta*x)/um-y[1]/(2*gamma*gamma)))
	})
	if worst > 1e-7 {
		t.Errorf("Schlichting profile departs from the ODE solution by %g", worst)
	}
	k := 2 * math.Pi * quad.Fixed(func(r float64) float64 { u := j.Velocity(x, r); return u * u * r }, 0, 400*j.HalfWidth(x), 20000, nil, 0)
	if !near(k, j.K, 1e-4) {
		t.Errorf("2π∫u²r dr: got %g, want K = %g", k, j.K)
	}
	// r½ = 5.2689·νx/sqrt(K) (reference sheet §10, DERIVED)
	if want := 5.2689 * j.Nu * x / math.Sqrt(j.K); !near(j.HalfWidth(x), want, 1e-4) {
		t.Errorf("half width: got %g, want %g", j.HalfWidth(x), want)
	}
}

// TestLaminarPlume checks the laminar regime of the plume against the
// Schlichting nozzle forms of the reference sheet §10 (DERIVED), on the
// effective diameter and the ambient viscosity:
// um/U0 = 0.09375·Re·D/x and r½/x = 5.9453/Re downstream of x = 0.094·Re·D.
func TestLaminarPlume(t *testing.T) {
	// a 2 mm bleed jet at 8 m/s: Re ≈ 1000
	g := Air()
	mj := 8 / g.SoundSpeed(288.15)
	c := Condition{Primary: Stream{NPR: g.PressureRatio(mj), TotalTemperature: 288.15 * g.TemperatureRatio(mj)}, Ambient: StandardAmbient()}
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.002}, c, Limits{Velocity: 0.5, Temperature: 323.15})
	if err != nil {
		t.Fatal(err)
	}
	if !p.Laminar() || !Has(p.Flags(), FlagLaminar) {
		t.Fatalf("Re %g: not flagged laminar", p.Exit().AmbientReynolds)
	}
	e := p.Exit()
	re, d := e.AmbientReynolds, e.EffectiveDiameter
	for _, xd := range []float64{0.2, 0.5, 1} {
		x := xd * re * d
		if got, want := p.CenterlineVelocity(x)/e.Velocity, 0.09375*re*d/x; !near(got, want, 1e-9) {
			t.Errorf("x %g D: got um/U0 %.6f, want %.6f", x/d, got, want)
		}
		if got, want := p.HalfVelocityRadius(x)/x, 5.9453/re; !near(got, want, 1e-4) {
			t.Errorf("x %g D: got r½/x %.6f, want %.6f", x/d, got, want)
		}
	}
	// the laminar zone reaches far: the conservative zone covers it
	if v := p.Envelope(VelocityZone, Conservative); v.Length < p.Envelope(VelocityZone, Nominal).Length {
		t.Errorf("conservative %g shorter than laminar nominal %g", v.Length, p.Envelope(VelocityZone, Nominal).Length)
	}
}
