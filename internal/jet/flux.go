package jet

import (
	"math"
	"sort"
)

// The conservative field's flux floor.
//
// A free jet at ambient pressure carries its exit momentum flux and its
// exit excess-enthalpy flux (the mixture-fraction flux, with a constant cp)
// unchanged downstream (conservation laws; the turbulent share, about 5–10 %
// in the developed region, is carried by the fluctuations). A mean field
// built from a decay law and a spreading law need not: where the half-width
// lags the decay of the centreline, the field carries too little and its
// contours are too narrow. The conservative field is therefore widened,
// wherever it falls short, just enough for its mean flow, with its own
// density, to carry the fraction Model.FluxFloor of both exit fluxes
// (derived from the conservation laws; the construction is the project's
// own). Giving the turbulent share to the mean only widens the zones.

const (
	// fluxEtaMax is where the radial integrals stop, in half-value widths
	// outside the core: the thermal profile of the widest model (λ = 1.3)
	// has fallen to exp(−ln2·(5/1.3)²) = 3·10⁻⁵ there, and every integrand
	// carries the velocity profile as well.
	fluxEtaMax = 5
	// fluxCoreNodes and fluxMaxNodes size the axial table of the floor.
	fluxCoreNodes = 12
	fluxMaxNodes  = 160
	// fluxGrowth is the ratio of successive axial nodes past the core.
	fluxGrowth = 1.12
)

// gaussLegendre16 holds 16-point Gauss–Legendre nodes and weights on [0, 1]
// (exact for polynomials to degree 31; the smooth integrands here converge
// far below the floor's 2 % headroom, checked by the flux property test).
var gaussLegendre16 = newGaussLegendre(16)

type quadrature struct{ x, w []float64 }

// newGaussLegendre returns the n-point Gauss–Legendre rule mapped to [0, 1]
// (nodes from Newton's method on the Legendre polynomial, the classical
// construction).
func newGaussLegendre(n int) quadrature {
	q := quadrature{x: make([]float64, n), w: make([]float64, n)}
	for i := 0; i < n; i++ {
		z := math.Cos(math.Pi * (float64(i) + 0.75) / (float64(n) + 0.5))
		var dp float64
		for it := 0; it < 100; it++ {
			p1, p2 := 1.0, 0.0
			for j := 1; j <= n; j++ {
				p1, p2 = ((2*float64(j)-1)*z*p1-(float64(j)-1)*p2)/float64(j), p1
			}
			dp = float64(n) * (z*p1 - p2) / (z*z - 1)
			dz := p1 / dp
			z -= dz
			if math.Abs(dz) < 1e-15 {
				break
			}
		}
		q.x[i] = (1 - z) / 2
		q.w[i] = 1 / ((1 - z*z) * dp * dp)
	}
	return q
}

// fluxState is what the flux integrals need of a jet besides the field.
type fluxState struct {
	pa, ta         float64 // ambient pressure (Pa) and temperature (K)
	dT0            float64 // excess total temperature at the exit, K
	jet, air       Gas
	momentum, mass float64 // exit momentum flux (N) and mass flow (kg/s)
}

func newFluxState(e Exit, a Ambient) fluxState {
	return fluxState{
		pa: a.Pressure, ta: a.Temperature, dT0: e.TotalTemperature - a.Temperature,
		jet: e.Gas, air: Air(), momentum: e.Thrust, mass: e.MassFlow,
	}
}

// density returns the mean density where the velocity is u (m/s) and the
// jet-gas (mixture) fraction theta, kg/m³: ambient pressure, the static
// temperature Ta + ΔT0·θ − u²/(2cp) and the mixture's gas constant.
func (s *fluxState) density(u, theta float64) float64 {
	r := s.air.R + theta*(s.jet.R-s.air.R)
	cp := s.air.Cp() + theta*(s.jet.Cp()-s.air.Cp())
	t := s.ta + s.dT0*theta - u*u/(2*cp)
	// a static temperature below a tenth of ambient is not a state of this
	// model; keep the density finite (it is never reached by real inputs)
	t = math.Max(t, 0.1*s.ta)
	return s.pa / (r * t)
}

// fluxes returns the momentum flux (N) and the mixture-fraction mass flux
// (kg/s) of the field at x for a shoulder half-width w (m), as
// c0 + c1·w + c2·w² pairs: J = jm[0] + jm[1]·w + jm[2]·w², and likewise H.
func (f *field) fluxes(s *fluxState, x float64) (jm, hm [3]float64) {
	uc, th, rc := f.uc(x), f.thetac(x), f.rc(x)
	rho := s.density(uc, th)
	jm[0] = math.Pi * rc * rc * rho * uc * uc
	hm[0] = math.Pi * rc * rc * rho * uc * th
	q := gaussLegendre16
	var a1, a2, b1, b2 float64
	for i, t := range q.x {
		eta := fluxEtaMax * t
		u := uc * f.su.value(eta)
		y := th * f.st.value(eta/f.lambda)
		d := s.density(u, y)
		wt := q.w[i] * fluxEtaMax
		a1 += wt * d * u * u
		a2 += wt * d * u * u * eta
		b1 += wt * d * u * y
		b2 += wt * d * u * y * eta
	}
	jm[1], jm[2] = 2*math.Pi*rc*a1, 2*math.Pi*a2
	hm[1], hm[2] = 2*math.Pi*rc*b1, 2*math.Pi*b2
	return jm, hm
}

// widthFor returns the smallest w ≥ 0 with c0 + c1·w + c2·w² ≥ target
// (c1, c2 ≥ 0).
func widthFor(c [3]float64, target float64) float64 {
	need := target - c[0]
	switch {
	case need <= 0:
		return 0
	case c[2] <= 0 && c[1] <= 0:
		return math.Inf(1)
	case c[2] <= 0:
		return need / c[1]
	}
	return (-c[1] + math.Sqrt(c[1]*c[1]+4*c[2]*need)) / (2 * c[2])
}

// floorWidth returns the half-width the field needs at x to carry the
// fraction frac of both exit fluxes, m.
func (f *field) floorWidth(s *fluxState, x, frac float64) float64 {
	jm, hm := f.fluxes(s, x)
	w := widthFor(jm, frac*s.momentum)
	if s.mass > 0 {
		w = math.Max(w, widthFor(hm, frac*s.mass))
	}
	return w
}

// buildFloor tabulates the flux floor of the half-width on axial nodes:
// evenly through the core, then in a geometric progression until the
// unwidened field carries the fluxes by itself over several nodes (it does
// in the developed region, where the density is near ambient and
// 2B²S²/ln2 ≥ 1). Between nodes the floor is interpolated linearly and
// raised by the floor's headroom (the table is built for a slightly larger
// fraction than the floor, so that interpolation never drops below it).
func (f *field) buildFloor(e Exit, a Ambient) {
	frac := f.m.FluxFloor
	if frac <= 0 || f.laminar || !(f.uj > 0) {
		return
	}
	s := newFluxState(e, a)
	// 2 % headroom for the linear interpolation between nodes (derived:
	// the floor's second difference over one node step stays well below it)
	frac *= 1.02
	add := func(x float64) bool {
		wf := f.floorWidth(&s, x, frac)
		need := wf
		if n := len(f.floorW); n > 0 {
			// a free jet does not narrow, and once widened it goes on
			// spreading at least at the far-field rate: where the density
			// rises as the jet cools, less width would carry the flux, but
			// the jet keeps what it has
			wf = math.Max(wf, f.floorW[n-1]+f.m.S*(x-f.floorX[n-1]))
		}
		f.floorX = append(f.floorX, x)
		f.floorW = append(f.floorW, wf)
		return need > f.baseW(x)
	}
	// the floor only grows (above), so it is quiet once the spreading law
	// has overtaken it for good
	add(0)
	for i := 1; i <= fluxCoreNodes; i++ {
		add(f.lc * float64(i) / fluxCoreNodes)
	}
	x := math.Max(f.lc, f.dj)
	quiet := 0
	for len(f.floorX) < fluxMaxNodes && quiet < 4 {
		x *= fluxGrowth
		if add(x) {
			quiet = 0
		} else {
			quiet++
		}
	}
}

// floor returns the flux floor of the half-width at x, m (0 where there is
// none).
func (f *field) floor(x float64) float64 {
	n := len(f.floorX)
	switch {
	case n == 0 || !(x > 0):
		return 0
	case x > f.floorX[n-1]:
		// past the table the spreading law carries the fluxes; the floor
		// goes on growing at the far-field rate so that w never drops
		return f.floorW[n-1] + f.m.S*(x-f.floorX[n-1])
	}
	i := sort.SearchFloat64s(f.floorX, x)
	if i == 0 {
		return f.floorW[0]
	}
	x0, x1 := f.floorX[i-1], f.floorX[i]
	w0, w1 := f.floorW[i-1], f.floorW[i]
	return w0 + (w1-w0)*(x-x0)/(x1-x0)
}
