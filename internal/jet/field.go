package jet

import "math"

const (
	// laminarRoundRe is the Reynolds number below which a round jet is
	// treated as laminar: about 2,000 (common practice; "fully turbulent for
	// Re > 2000" in Aaron Farrell's turbulent-jet notes).
	laminarRoundRe = 2000
	// laminarUpperRe is the upper end of the transition band: the
	// transition Reynolds number is uncertain by about a factor of two
	// (reference sheet §10), so up to twice the common-practice value the
	// conservative zones hold the laminar solution's zones as well
	// (SUGGESTION), and the conservative zone has no cliff at the switch.
	laminarUpperRe = 2 * laminarRoundRe
	// laminarPlaneRe is the slot Reynolds number below which a plane jet is
	// laminar: about 30 (Andrade 1939, from memory; common practice).
	laminarPlaneRe = 30
	// fittedRe is the Reynolds number above which the turbulent decay
	// constants were measured (about 10⁴; decay is faster below it,
	// Abdel-Rahman, Al-Fahed & Chakroun 1996).
	fittedRe = 1e4
	// planeAspectMin is the aspect ratio from which a rectangular jet has a
	// statistically two-dimensional region (Deo, Mi & Nathan 2007: AR ≥ 20).
	planeAspectMin = 20
)

// field is the mean flow of one jet under one set of constants. Lengths are
// metres in the jet frame.
type field struct {
	m       Model
	uj      float64 // fully expanded velocity, m/s
	dj, de  float64 // fully expanded and Thring–Newby diameters, m
	r0      float64 // radius of the potential core at the exit, dj/2
	lc      float64 // potential-core length, m
	x0      float64 // far-field virtual origin of the spreading, m
	x0u     float64 // virtual origin of the velocity decay, ≥ x0, m
	x0t     float64 // virtual origin of the temperature decay, ≥ x0, m
	wRate   float64 // growth of the shoulder half-width inside the core
	wc      float64 // shoulder half-width at the end of the core, m
	dT0     float64 // excess total temperature T0 − Ta, K
	lambda  float64 // thermal half-width over velocity half-width
	su, st  shape   // radial shapes of velocity and temperature
	laminar bool    // Schlichting round laminar jet
	re      float64 // Reynolds number Uj·D_eff/ν∞ (laminar fields)
	// plane-jet law for high-aspect-ratio rectangular exits
	plane, planeLaminar bool
	planeB              float64 // momentum-equivalent slot width ρj/ρa·height·Aj/A, m
	reH                 float64 // slot Reynolds number
	// floorX and floorW tabulate the flux floor of the half-width (m) at
	// axial nodes (m); empty when the model has no floor (see flux.go).
	floorX, floorW []float64
}

func newField(m Model, n Nozzle, e Exit, a Ambient, laminar bool) field {
	if n.Contour == Pipe && m.PipeB > 0 && m.PipeKT > 0 {
		m.B, m.KT = m.PipeB, m.PipeKT
	}
	f := field{m: m, uj: e.Velocity, dj: e.FullyExpandedDiameter, de: e.EffectiveDiameter, re: e.AmbientReynolds}
	f.r0 = f.dj / 2
	f.dT0 = e.TotalTemperature - a.Temperature
	f.x0 = m.X0 * f.dj
	f.laminar = laminar
	if laminar {
		// the Schlichting jet of the same kinematic momentum flux in
		// ambient fluid: K = (π/4)·Uj²·D_eff², ν = ν∞
		f.lc = laminarRoundCore * f.re * f.de
		f.su = schlichtingShape(1)
		f.st = schlichtingShape(prandtlAir)
		f.lambda = f.st.half / f.su.half
	} else {
		h := HeatingFactor(e.Mach, e.DensityRatio, e.Gas.Gamma)
		if !m.HeatedCore {
			h = math.Max(h, 1)
		}
		f.lc = math.Max(LauCoreLength(e.Mach)*h, m.CoreMin) * f.dj
		s := 1 / e.DensityRatio
		// The shoulder's vorticity thickness grows with the mixing layer,
		// but its half-velocity line is held no closer to the axis than
		// the lip line, where it stays through the core of round jets
		// (common practice).
		phi := math.Min(1, GrowthReduction(e.ConvectiveMach)+m.GrowthScatter)
		growth := m.Growth / 2 * (1 + math.Sqrt(s)) * phi
		f.wRate = math.Max(growth/gaussianVorticityThickness, f.r0/f.lc)
		f.wc = f.wRate * f.lc
		f.su, f.st = gaussianShape(), gaussianShape()
		f.lambda = m.Lambda
	}
	f.x0u = math.Max(f.x0, f.lc-m.B*f.de)
	f.x0t = math.Max(f.x0, f.lc-m.KT*f.de)
	if m.PlaneLaw && n.Kind == Rectangular && n.AspectRatio() >= planeAspectMin {
		f.plane = true
		de := e.Diameter
		f.planeB = n.Height * (f.dj * f.dj / (de * de)) * e.DensityRatio
		f.reH = e.SlotReynolds
		f.planeLaminar = f.reH < laminarPlaneRe
	}
	f.buildFloor(e, a)
	return f
}

// kinks returns the axial positions where the field's laws change and its
// contours may have a corner: the end of the core, the ends of the caps at
// Uj and at the exit temperature, and where the far-field width takes over.
func (f *field) kinks() []float64 {
	k := []float64{f.lc, f.x0u + f.m.B*f.de, f.x0t + f.m.KT*f.de}
	if f.m.S > 0 {
		k = append(k, f.x0+f.wc/f.m.S)
	}
	return k
}

// uc returns the centreline velocity at x, m/s.
func (f *field) uc(x float64) float64 {
	if x <= 0 {
		return f.uj
	}
	u := f.uj
	switch {
	case x <= f.lc:
	case f.laminar:
		u = f.uj * laminarRoundCore * f.re * f.de / x
	case f.m.Blend:
		u = f.uj * blendDecay(x, f.lc, f.x0u, f.m.B*f.de)
	case x-f.x0u > f.m.B*f.de:
		// beyond x0 + B·D_eff; before it the law is capped at Uj
		// (the virtual origin may lie downstream of a short hot core)
		u = f.uj * f.m.B * f.de / (x - f.x0u)
	}
	if f.plane {
		u = min(u, f.planeUc(x))
	}
	return min(u, f.uj)
}

// planeUc is the centreline velocity of the plane-jet law, m/s.
func (f *field) planeUc(x float64) float64 {
	if f.planeLaminar {
		// Bickley 1937: um/U0 = 0.45428·(Re·b/x)^(1/3)
		return f.uj * math.Min(1, laminarPlaneDecay*math.Cbrt(f.reH*f.planeB/x))
	}
	return NewPlaneJet(f.uj, f.planeB, f.m).Centerline(x)
}

// thetac returns the centreline excess total temperature as a fraction of
// T0 − Ta.
func (f *field) thetac(x float64) float64 {
	switch {
	case x <= 0:
		return 1
	case f.laminar:
		// heat-flux conservation with the Schlichting profiles (derived):
		// ΔTc/ΔT0 = (1 + 2·Pr)/32·Re·D/x
		return math.Min(1, (1+2*prandtlAir)/32*f.re*f.de/x)
	case x <= f.lc:
		return 1
	case f.m.Blend:
		return blendDecay(x, f.lc, f.x0t, f.m.KT*f.de)
	case x-f.x0t <= f.m.KT*f.de:
		return 1
	}
	return f.m.KT * f.de / (x - f.x0t)
}

// blendDecay returns a centreline value, as a fraction of the exit value,
// past the end of the core at lc (m): the far law a/(x − x0) beyond
// xj = x0 + 2a, where it gives 1/2, and before xj a cubic Hermite that
// leaves 1 with zero slope at lc and meets the far law's value and slope
// at xj. It is monotone (the Fritsch–Carlson condition holds while
// x0 − lc ≤ 4a, i.e. while D_eff ≥ 0.17 Dj) and continuous with its slope.
func blendDecay(x, lc, x0, a float64) float64 {
	xj := x0 + 2*a
	if x >= xj {
		return a / (x - x0)
	}
	h := xj - lc
	t := (x - lc) / h
	m1 := -a / ((xj - x0) * (xj - x0)) * h // far-law slope at xj, per unit t
	// Hermite basis with p0 = 1, m0 = 0, p1 = 1/2, m1
	t2, t3 := t*t, t*t*t
	v := (2*t3-3*t2+1)*1 + (-2*t3+3*t2)*0.5 + (t3-t2)*m1
	return min(1, v)
}

// rc returns the radius of the potential core, m.
func (f *field) rc(x float64) float64 {
	if x >= f.lc {
		return 0
	}
	return f.r0 * (1 - max(x, 0)/f.lc)
}

// w returns the half-value width of the velocity shoulder, m: the
// spreading law's width, widened where needed to the flux floor.
func (f *field) w(x float64) float64 {
	if len(f.floorX) == 0 {
		return f.baseW(x)
	}
	return max(f.baseW(x), f.floor(x))
}

// baseW returns the half-value width of the velocity shoulder from the
// mixing-layer and far-field spreading laws alone, m.
func (f *field) baseW(x float64) float64 {
	switch {
	case x <= 0:
		return 0
	case f.laminar:
		return laminarRoundWidth * x / f.re
	case x <= f.lc:
		return f.wRate * x
	case f.m.Continuous:
		return max(f.wc+f.m.S*(x-f.lc), f.m.S*(x-f.x0))
	}
	return max(f.wc, f.m.S*(x-f.x0))
}

// u returns the mean axial velocity at (x, r), m/s.
func (f *field) u(x, r float64) float64 {
	if x < 0 {
		return 0
	}
	return f.uc(x) * f.profile(f.su, r-f.rc(x), f.w(x))
}

// theta returns the excess total temperature at (x, r) as a fraction of
// T0 − Ta.
func (f *field) theta(x, r float64) float64 {
	if x < 0 {
		return 0
	}
	return f.thetac(x) * f.profile(f.st, r-f.rc(x), f.lambda*f.w(x))
}

func (f *field) profile(s shape, y, w float64) float64 {
	switch {
	case y <= 0:
		return 1
	case w <= 0:
		return 0
	}
	return s.value(y / w)
}

// contourU returns the radius where u = lim at x (m), or 0 where the whole
// section is at or below lim. tail multiplies the shoulder part.
func (f *field) contourU(x, lim, tail float64) float64 {
	uc := f.uc(x)
	if x < 0 || uc <= lim {
		return 0
	}
	return f.rc(x) + tail*f.w(x)*f.su.inverse(lim/uc)
}

// contourT returns the radius where the excess total temperature equals the
// fraction eps of T0 − Ta at x (m), or 0.
func (f *field) contourT(x, eps, tail float64) float64 {
	th := f.thetac(x)
	if x < 0 || th <= eps {
		return 0
	}
	return f.rc(x) + tail*f.lambda*f.w(x)*f.st.inverse(eps/th)
}

// tipU returns the x where the centreline velocity falls to lim, m (0 if
// the jet is no faster than lim).
func (f *field) tipU(lim float64) float64 {
	return monotoneRoot(func(x float64) float64 { return f.uc(x) - lim }, f.lc+f.dj)
}

// tipT returns the x where the centreline excess temperature falls to the
// fraction eps, m.
func (f *field) tipT(eps float64) float64 {
	return monotoneRoot(func(x float64) float64 { return f.thetac(x) - eps }, f.lc+f.dj)
}

// monotoneRoot returns the x ≥ 0 where a non-increasing g changes sign, to
// a relative precision of about 1e-12; 0 when g(0) ≤ 0. start is a first
// guess of the scale.
func monotoneRoot(g func(float64) float64, start float64) float64 {
	if g(0) <= 0 {
		return 0
	}
	lo, hi := 0.0, math.Max(start, 1e-9)
	for i := 0; g(hi) > 0; i++ {
		lo, hi = hi, hi*2
		if i > 200 {
			return hi
		}
	}
	for i := 0; i < 200 && hi-lo > 1e-12*hi; i++ {
		mid := (lo + hi) / 2
		if g(mid) > 0 {
			lo = mid
		} else {
			hi = mid
		}
	}
	return hi
}
