package jet

import (
	"fmt"
	"math"
)

// Limits are the thresholds that bound the zones.
type Limits struct {
	Velocity    float64 // mean velocity limit, m/s
	Temperature float64 // total-temperature limit, K (absolute)
}

// DefaultLimits returns 5 m/s and 50 °C (323.15 K): common practice for
// keeping people and stands out of an exhaust (a 5 m/s wind barely moves a
// stand; 50 °C is below the pain threshold of brief skin contact, ISO
// 13732-1 from memory).
func DefaultLimits() Limits { return Limits{Velocity: 5, Temperature: 323.15} }

// Plume is the predicted mean flow of one nozzle at one operating point,
// with its zones for one pair of limits. Build it with [NewPlume]; its
// methods are safe for concurrent use.
type Plume struct {
	nozzle Nozzle
	cond   Condition
	exit   Exit
	limits Limits
	nom    field
	cons   field
	lipW   float64 // half of the long side of the exit (radius for round exits), m
	lipH   float64 // half of the short side, m
	// lightLayer is the Brown & Roshko (1974) density factor of the lip
	// layer's growth, (1 + sqrt(ρa/ρj))/2, never below 1: a light (hot)
	// jet's mixing layer grows faster; a dense one's is not let shrink
	lightLayer float64
	buoy       Buoyancy
	env        [2][2]Envelope // [zone-1][variant-1]
	bent       *BentPlume     // nil unless buoyancy bends the zones
	flags      []Flag
}

// NewPlume predicts the plume of nozzle n at operating point c and bounds its
// zones by lim, with the published constants of [NominalModel] and
// [ConservativeModel].
func NewPlume(n Nozzle, c Condition, lim Limits) (*Plume, error) {
	return NewPlumeWith(n, c, lim, NominalModel(), ConservativeModel())
}

// NewPlumeWith is [NewPlume] with other constants.
func NewPlumeWith(n Nozzle, c Condition, lim Limits, nominal, conservative Model) (*Plume, error) {
	e, err := ExitState(n, c)
	if err != nil {
		return nil, err
	}
	if err := positive("velocity limit", lim.Velocity, "m/s"); err != nil {
		return nil, err
	}
	if err := positive("temperature limit", lim.Temperature, "K"); err != nil {
		return nil, err
	}
	if lim.Temperature <= c.Ambient.Temperature {
		return nil, &InputError{Field: "temperature limit", Reason: fmt.Sprintf(
			"(%.2f K) must be above the ambient temperature (%.2f K): otherwise the whole cell is a hot zone",
			lim.Temperature, c.Ambient.Temperature)}
	}
	p := &Plume{nozzle: n, cond: c, exit: e, limits: lim}
	// an exit state that overflowed is refused before any field is built
	// on it (the zones are checked again once they are)
	if err := p.finite(); err != nil {
		return nil, err
	}
	laminar := e.AmbientReynolds < laminarRoundRe
	p.nom = newField(nominal, n, e, c.Ambient, laminar)
	p.cons = newField(conservative, n, e, c.Ambient, false)
	outer := e.Diameter
	if n.Kind == Coaxial {
		outer = n.SecondaryDiameter
	}
	p.lipW = math.Max(outer, e.FullyExpandedDiameter) / 2
	p.lipH = p.lipW
	if n.Kind == Rectangular {
		// the fully expanded section is taken as the exit scaled evenly
		k := math.Max(1, e.FullyExpandedDiameter/e.Diameter)
		p.lipW, p.lipH = k*n.Width/2, k*n.Height/2
	}
	p.lightLayer = math.Max(1, (1+math.Sqrt(1/e.DensityRatio))/2)
	br := RAir * c.Ambient.Temperature / (e.Gas.R * e.TotalTemperature)
	p.buoy = buoyancyOf(e.DensityRatio, br, e.Velocity, math.Pi*e.FullyExpandedDiameter*e.FullyExpandedDiameter/4)
	p.buildEnvelopes()
	if err := p.finite(); err != nil {
		return nil, err
	}
	if p.bends() {
		p.buildBent()
		if err := p.bent.finite(); err != nil {
			return nil, err
		}
	}
	p.flags = p.regimeFlags()
	return p, nil
}

// bends reports whether a conservative zone reaches past the onset of
// buoyancy (the FlagBuoyant regime): a light jet rises, a dense one sinks.
func (p *Plume) bends() bool {
	zone := math.Max(p.env[0][1].Length, p.env[1][1].Length)
	return p.buoy.ReducedGravity != 0 && zone > p.buoy.Onset
}

// finite returns an error naming the first number of the prediction that is
// not finite: a zone whose size overflowed must never read as no zone.
func (p *Plume) finite() error {
	e := p.exit
	vals := []struct {
		name string
		v    float64
	}{
		{"fully expanded Mach number", e.Mach}, {"jet velocity", e.Velocity},
		{"static temperature", e.StaticTemperature}, {"jet density", e.Density},
		{"density ratio", e.DensityRatio}, {"fully expanded diameter", e.FullyExpandedDiameter},
		{"effective diameter", e.EffectiveDiameter}, {"mass flow", e.MassFlow}, {"thrust", e.Thrust},
		{"Reynolds number", e.Reynolds}, {"ambient-viscosity Reynolds number", e.AmbientReynolds},
		{"convective Mach number", e.ConvectiveMach}, {"exit pressure", e.ExitPressure},
		{"shock-cell spacing", e.ShockCellSpacingUpper}, {"Mach-disk distance", e.MachDiskDistance},
		{"nominal potential core", p.nom.lc}, {"conservative potential core", p.cons.lc},
		{"momentum length", finiteOrInf(p.buoy.MomentumLength)},
	}
	for z := range p.env {
		for v := range p.env[z] {
			en := &p.env[z][v]
			what := en.Variant.String() + " " + en.Zone.String()
			vals = append(vals,
				struct {
					name string
					v    float64
				}{what + " length", en.Length},
				struct {
					name string
					v    float64
				}{what + " width", en.MaxRadius},
				struct {
					name string
					v    float64
				}{what + " outline tolerance", en.Tolerance})
			for _, pt := range en.Points {
				if bad(pt[0]) || bad(pt[1]) {
					return &InputError{Field: "operating point", Reason: fmt.Sprintf("gives a %s outline that is not finite: the inputs are outside what the plume model can compute", what)}
				}
			}
		}
	}
	for _, x := range vals {
		if bad(x.v) {
			return &InputError{Field: "operating point", Reason: fmt.Sprintf("gives a %s of %v: the inputs are outside what the plume model can compute", x.name, x.v)}
		}
	}
	return nil
}

// bad reports whether v is NaN or infinite.
func bad(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) }

// finiteOrInf maps +Inf (a neutral jet's momentum length: no bending) to 0
// for the finiteness check and keeps every other value.
func finiteOrInf(v float64) float64 {
	if math.IsInf(v, 1) {
		return 0
	}
	return v
}

// Exit returns the fully expanded exit state.
func (p *Plume) Exit() Exit { return p.exit }

// Nozzle returns the nozzle.
func (p *Plume) Nozzle() Nozzle { return p.nozzle }

// Condition returns the operating point.
func (p *Plume) Condition() Condition { return p.cond }

// Limits returns the limits the zones are bounded by.
func (p *Plume) Limits() Limits { return p.limits }

// Laminar reports whether the nominal field is the laminar solution.
func (p *Plume) Laminar() bool { return p.nom.laminar }

// CoreLength returns the potential-core length of the given variant, m.
func (p *Plume) CoreLength(v Variant) float64 {
	if v == Conservative {
		return math.Max(p.cons.lc, p.nom.lc)
	}
	return p.nom.lc
}

// Velocity returns the nominal mean axial velocity at (x, r), m/s.
func (p *Plume) Velocity(x, r float64) float64 { return p.nom.u(x, math.Abs(r)) }

// TotalTemperature returns the nominal mean total temperature at (x, r), K.
func (p *Plume) TotalTemperature(x, r float64) float64 {
	return p.cond.Ambient.Temperature + p.nom.dT0*p.nom.theta(x, math.Abs(r))
}

// Temperature returns the nominal mean static temperature at (x, r), K: the
// total temperature less the kinetic part u²/(2·cp).
func (p *Plume) Temperature(x, r float64) float64 {
	u := p.Velocity(x, r)
	return p.TotalTemperature(x, r) - u*u/(2*p.exit.Gas.Cp())
}

// CenterlineVelocity returns the nominal centreline velocity at x, m/s.
func (p *Plume) CenterlineVelocity(x float64) float64 { return p.Velocity(x, 0) }

// CenterlineTemperature returns the nominal centreline static temperature
// at x, K.
func (p *Plume) CenterlineTemperature(x float64) float64 { return p.Temperature(x, 0) }

// HalfVelocityRadius returns the nominal radius where the velocity is half
// its centreline value, m (for x > 0).
func (p *Plume) HalfVelocityRadius(x float64) float64 { return p.nom.rc(x) + p.nom.w(x) }

// EdgeRadius returns the radius at x (m) where the mean velocity of the
// given variant falls to the fraction frac (0 < frac < 1) of its centreline
// value, m: for the conservative variant the larger of the conservative
// field's edge, with its tail factor, and the nominal one. It is the width
// of the plume that a collector must take. 0 for x < 0.
func (p *Plume) EdgeRadius(v Variant, x, frac float64) float64 {
	if x < 0 {
		return 0
	}
	edge := func(f *field, tail float64) float64 { return f.rc(x) + tail*f.w(x)*f.su.inverse(frac) }
	r := edge(&p.nom, 1)
	if v == Conservative {
		r = math.Max(r, edge(&p.cons, p.cons.m.Tail))
	}
	return r
}

// MixingLayer returns the nominal mixing layer at x.
func (p *Plume) MixingLayer(x float64) MixingLayer {
	f := &p.nom
	ml := MixingLayer{X: x, Inner: f.rc(x)}
	w := f.w(x)
	ml.Outer = ml.Inner + w*f.su.inverse(0.01)
	ml.VorticityThickness = w * gaussianVorticityThickness
	return ml
}

// Buoyancy returns how gravity bends the jet.
func (p *Plume) Buoyancy() Buoyancy { return p.buoy }

// Envelope returns the zone of the given kind and variant. The returned
// value must not be modified.
func (p *Plume) Envelope(z Zone, v Variant) *Envelope { return &p.env[z-1][v-1] }

// Flags returns the regime flags, each with its reason.
func (p *Plume) Flags() []Flag { return p.flags }

// nearEdge returns the conservative lip-edge construction: the outer edge
// of a Görtler mixing layer drawn from the nozzle lip, r = lip + x·slope,
// with slope = erfinv(1 − 2ε)/σ for the threshold fraction ε (the project
// reference sheet's near-field patch, a SUGGESTION; Görtler 1942 profile).
// Rectangular exits grow from their corners.
func (p *Plume) nearEdge(x, slope float64) float64 {
	if slope < 0 {
		slope = 0
	}
	slope *= p.lightLayer
	if p.nozzle.Kind == Rectangular {
		return math.Hypot(p.lipW+slope*x, p.lipH+slope*x)
	}
	return p.lipW + slope*x
}

func (p *Plume) buildEnvelopes() {
	lim := p.limits
	// velocity zone
	uLim := lim.Velocity
	nomU := func(x float64) float64 { return p.nom.contourU(x, uLim, 1) }
	consU := func(x float64) float64 { return p.cons.contourU(x, uLim, p.cons.m.Tail) }
	slopeU := 0.0
	if eps := uLim / p.exit.Velocity; eps < 1 {
		slopeU = math.Erfinv(1-2*eps) / p.cons.m.Sigma
	}
	nomTipU := p.nom.tipU(uLim)
	// where the conservative field is at least as fast, as wide and with as
	// wide a core as the nominal one, with the same profile shape, its
	// contour contains the nominal one and the nominal contour (a
	// logarithm) need not be evaluated
	same := p.nom.su == p.cons.su
	domU := func(x float64) bool {
		return same && p.cons.uc(x) >= p.nom.uc(x) && p.cons.rc(x) >= p.nom.rc(x) && p.cons.m.Tail*p.cons.w(x) >= p.nom.w(x)
	}
	// the larger of both contours in one pass over the fields' laws
	farU := func(x float64) float64 {
		c, n := &p.cons, &p.nom
		if x < 0 {
			return 0
		}
		cu, crc, cw := c.uc(x), c.rc(x), c.m.Tail*c.w(x)
		r := 0.0
		if cu > uLim {
			r = crc + cw*c.su.inverse(uLim/cu)
		}
		if nu, nrc, nw := n.uc(x), n.rc(x), n.w(x); !(same && cu >= nu && crc >= nrc && cw >= nw) && nu > uLim {
			r = max(r, nrc+nw*n.su.inverse(uLim/nu))
		}
		return r
	}
	p.env[0][0] = newEnvelope(VelocityZone, Nominal, uLim, nomTipU, nomU, p.nom.kinks()...)
	// in the transition band the jet may still be laminar: the
	// conservative zone holds the laminar solution's zone too
	var lam *field
	if !p.nom.laminar && p.exit.AmbientReynolds < laminarUpperRe {
		f := newField(p.nom.m, p.nozzle, p.exit, p.cond.Ambient, true)
		lam = &f
	}
	if lam != nil {
		far0 := farU
		farU = func(x float64) float64 { return max(far0(x), lam.contourU(x, uLim, 1)) }
		domU = func(float64) bool { return false }
		nomTipU = max(nomTipU, lam.tipU(uLim))
	}
	p.env[0][1] = p.conservative(VelocityZone, uLim, nomTipU, p.cons.tipU(uLim), farU, consU, domU, slopeU)

	// hot zone, on the excess total temperature
	tLim := lim.Temperature
	dT0 := p.nom.dT0
	if dT0 <= tLim-p.cond.Ambient.Temperature {
		p.env[1][0] = Envelope{Zone: HotZone, Variant: Nominal, Limit: tLim}
		p.env[1][1] = Envelope{Zone: HotZone, Variant: Conservative, Limit: tLim}
		return
	}
	eps := (tLim - p.cond.Ambient.Temperature) / dT0
	nomT := func(x float64) float64 { return p.nom.contourT(x, eps, 1) }
	consT := func(x float64) float64 { return p.cons.contourT(x, eps, p.cons.m.Tail) }
	slopeT := p.cons.m.Lambda * math.Erfinv(1-2*eps) / p.cons.m.Sigma
	nomTipT := p.nom.tipT(eps)
	sameT := p.nom.st == p.cons.st
	domT := func(x float64) bool {
		return sameT && p.cons.thetac(x) >= p.nom.thetac(x) && p.cons.rc(x) >= p.nom.rc(x) &&
			p.cons.m.Tail*p.cons.lambda*p.cons.w(x) >= p.nom.lambda*p.nom.w(x)
	}
	farT := func(x float64) float64 {
		c, n := &p.cons, &p.nom
		if x < 0 {
			return 0
		}
		ct, crc, cw := c.thetac(x), c.rc(x), c.m.Tail*c.lambda*c.w(x)
		r := 0.0
		if ct > eps {
			r = crc + cw*c.st.inverse(eps/ct)
		}
		if nt, nrc, nw := n.thetac(x), n.rc(x), n.lambda*n.w(x); !(sameT && ct >= nt && crc >= nrc && cw >= nw) && nt > eps {
			r = max(r, nrc+nw*n.st.inverse(eps/nt))
		}
		return r
	}
	p.env[1][0] = newEnvelope(HotZone, Nominal, tLim, nomTipT, nomT, p.nom.kinks()...)
	if lam != nil {
		far0 := farT
		farT = func(x float64) float64 { return max(far0(x), lam.contourT(x, eps, 1)) }
		domT = func(float64) bool { return false }
		nomTipT = max(nomTipT, lam.tipT(eps))
	}
	p.env[1][1] = p.conservative(HotZone, tLim, nomTipT, p.cons.tipT(eps), farT, consT, domT, slopeT)
}

// conservative builds a conservative envelope: the largest of the nominal
// contour, the conservative contour and the lip-edge construction. The
// lip edge describes the initial mixing layer only: it is used until the
// conservative contour catches up with it or reaches its widest point,
// whichever comes first, and never wider than that widest point (a zone
// that ends before the developed field outgrows the lip edge would
// otherwise end in a cliff at the lip edge's width).
//
// far is the larger of the nominal and conservative contours, cons the
// conservative one alone, and dominates tells where the conservative field
// contains the nominal one (elsewhere the two contours may cross, making
// corners at unknown places).
func (p *Plume) conservative(z Zone, limit, nomTip, consTip float64, far, cons func(float64) float64, dominates func(float64) bool, slope float64) Envelope {
	length := math.Max(nomTip, consTip)
	xPeak, rPeak := widest(far, length)
	near := func(x float64) float64 { return p.nearEdge(x, slope) }
	end := math.Min(catchUp(near, cons, consTip), xPeak)
	// never narrower than the exit section itself
	capR := math.Max(rPeak, near(0))
	radius := func(x float64) float64 {
		r := far(x)
		if x <= end {
			r = max(r, min(near(x), capR))
		}
		return r
	}
	// corners of the radius become vertices of the outline: the laws'
	// changes in both fields, the end of the lip edge and where it meets
	// its cap
	kinks := append(p.cons.kinks(), p.nom.kinks()...)
	kinks = append(kinks, end, monotoneRoot(func(x float64) float64 { return capR - near(x) }, p.lipW))
	// where the nominal contour may cross the conservative one, their max
	// has corners at unknown places: the chords are measured more finely
	// there
	return newEnvelopePeak(z, Conservative, limit, length, radius, &[2]float64{xPeak, math.Max(rPeak, radius(0))}, dominates, kinks...)
}

// widest returns where on [0, length] f is largest, and its value: a scan
// of 32 points polished by golden-section search.
func widest(f func(float64) float64, length float64) (x, r float64) {
	if length <= 0 {
		return 0, f(0)
	}
	const n = 32
	best := 0
	vals := [n + 1]float64{}
	for i := 0; i <= n; i++ {
		vals[i] = f(length * float64(i) / n)
		if vals[i] > vals[best] {
			best = i
		}
	}
	lo, hi := length*float64(max(best-1, 0))/n, length*float64(min(best+1, n))/n
	const g = 0.6180339887498949
	a, b := hi-g*(hi-lo), lo+g*(hi-lo)
	fa, fb := f(a), f(b)
	for i := 0; i < 20; i++ {
		if fa > fb {
			hi, b, fb = b, a, fa
			a = hi - g*(hi-lo)
			fa = f(a)
		} else {
			lo, a, fa = a, b, fb
			b = lo + g*(hi-lo)
			fb = f(b)
		}
	}
	x = (lo + hi) / 2
	if r = f(x); r < vals[best] {
		return length * float64(best) / n, vals[best]
	}
	return x, r
}

// catchUp returns where far(x) first reaches near(x), for a lip-edge
// construction near that starts ahead of the contour far: the first x in
// (0, end] with far(x) ≥ near(x), or end if far never catches up. It
// returns 0 when near is not ahead just downstream of the exit, so that the
// construction is only ever used from the lip onward.
func catchUp(near, far func(float64) float64, end float64) float64 {
	if end <= 0 {
		return 0
	}
	const n = 32
	prev := 0.0
	for i := 1; i <= n; i++ {
		t := float64(i) / n
		x := end * t * t
		if near(x) > far(x) {
			prev = x
			continue
		}
		if i == 1 {
			return 0
		}
		lo, hi := prev, x
		for k := 0; k < 60 && hi-lo > 1e-7*hi; k++ {
			mid := (lo + hi) / 2
			if near(mid) > far(mid) {
				lo = mid
			} else {
				hi = mid
			}
		}
		return hi
	}
	return end
}
