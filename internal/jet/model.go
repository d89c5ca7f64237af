package jet

// Model is a set of correlation constants. Use [NominalModel] for tables and
// [ConservativeModel] for clearance envelopes; a zero Model is not usable.
type Model struct {
	// Name is "nominal" or "conservative".
	Name string
	// B is the far-field centreline velocity decay constant,
	// Uc/Uj = B·D_eff/(x − x0).
	B float64
	// S is the far-field spreading rate of the half-velocity radius,
	// dr½/dx.
	S float64
	// X0 is the virtual origin of the far field in fully expanded diameters.
	X0 float64
	// KT is the decay constant of the excess total temperature,
	// ΔTc/ΔTj = KT·D_eff/(x − x0).
	KT float64
	// Lambda is the ratio of the thermal half-width to the velocity
	// half-width.
	Lambda float64
	// CoreMin is the shortest potential core the model allows, in fully
	// expanded diameters (0: no floor).
	CoreMin float64
	// HeatedCore, when true, shortens the core of heated jets by Witze's
	// density exponent; when false the cold-jet core is kept for hot jets.
	HeatedCore bool
	// Sigma is the Görtler spreading parameter of the mixing layer from the
	// nozzle lip, used for the conservative lip-edge construction.
	Sigma float64
	// Growth is the single-stream, equal-density vorticity-thickness growth
	// rate of a mixing layer, dδω/dx.
	Growth float64
	// Tail multiplies the radius of the far-field contour, for the measured
	// tail of the profile being wider than a Gaussian's.
	Tail float64
	// PlaneS and PlaneK are the plane-jet spreading rate dy½/dx and decay
	// constant Uc/U0 = PlaneK·sqrt(b/(x − x0)).
	PlaneS, PlaneK float64
	// PlaneLaw, when true, lets a high-aspect-ratio slot decay by the
	// plane-jet law near the exit (the slower of it and the round law's
	// centreline velocity is not taken: the faster decay is). The
	// conservative model keeps the round law, which bounds the slot's
	// measured decay from above.
	PlaneLaw bool
	// Blend, when true, joins the end of the core to the far-field laws
	// with a smooth monotone cubic (centreline velocity from Uj with zero
	// slope to the far law where it gives Uj/2, with the far law's slope;
	// the excess temperature alike) instead of holding the exit value
	// until the far law falls below it. The nominal model blends, so that
	// its centreline starts to fall at the end of the potential core; the
	// conservative one keeps the cap, which lies above the blend.
	Blend bool
	// PipeB and PipeKT replace B and KT for a pipe exit (Nozzle.Contour).
	PipeB, PipeKT float64
	// GrowthScatter is added to the compressibility reduction Φ(Mc) of the
	// mixing-layer growth (capped at 1): 0 for the central fit, the upper
	// end of its ±0.1 data scatter for the conservative model, whose
	// shoulder must not take the growth-reducing end.
	GrowthScatter float64
	// Continuous, when true, lets the half-width keep growing at the
	// far-field rate S from its end-of-core value, w = wc + S·(x − Lc),
	// instead of holding wc until S·(x − x0) catches up: a held width while
	// the centreline decays pinches the zone into a waist.
	Continuous bool
	// FluxFloor is the fraction of the exit momentum flux and of the exit
	// excess-enthalpy (mixture-fraction) flux that the mean field must carry
	// at every x, computed with its own density field; the half-width is
	// widened where the spreading law falls short. 0 enforces nothing.
	FluxFloor float64
}

// NominalModel returns central values of the published constants.
func NominalModel() Model {
	return Model{
		Name: "nominal",
		// B = 5.8 and S = 0.094: Hussein, Capp & George 1994 (laser-Doppler
		// data), as quoted in Pope 2000 Table 5.1.
		B: 5.8,
		S: 0.094,
		// x0 ≈ 4 D: Hussein, Capp & George 1994 (from memory).
		X0: 4,
		// KT = 5.0: scalar decay of Chen & Rodi 1980 for a mass fraction or
		// temperature excess.
		KT: 5.0,
		// λ = 1.2: Papanicolaou & List 1988 and Fischer et al. 1979, from
		// memory; 1/sqrt(0.7) = 1.195 for Sc_t = 0.7.
		Lambda:     1.2,
		CoreMin:    0,
		HeatedCore: true,
		// σ = 11: Liepmann & Laufer 1947 (from memory).
		Sigma: 11,
		// δω' = 0.181: Brown & Roshko 1974 (from memory), the σ = 9.8
		// Görtler value √π/σ.
		Growth: 0.181,
		Tail:   1,
		// S_p = 0.10–0.11 (Gutmark & Wygnanski 1976); K_u = 2.46 from the
		// Gaussian momentum identity for S_p = 0.11 (derived).
		PlaneS:   0.11,
		PlaneK:   2.46,
		PlaneLaw: true,
		Blend:    true,
		// a jet from a long pipe decays more slowly than one from a
		// contoured nozzle: B ≈ 6.4–6.6 (Mi, Nathan & Nobes 2001, from
		// memory); the scalar decay constant is scaled by the same ratio
		// (SUGGESTION)
		PipeB:  6.4,
		PipeKT: 5.0 * 6.4 / 5.8,
	}
}

// ConservativeModel returns the end of the published scatter that makes a zone
// bigger: slower decay, faster spreading, a longer core and a wider tail.
func ConservativeModel() Model {
	return Model{
		Name: "conservative",
		// B = 6.2: Chen & Rodi 1980 and Albertson et al. 1950, the upper end
		// of 5.7–6.2 in the literature.
		B: 6.2,
		// S = 0.10: upper end of 0.086–0.102 (Hussein, Capp & George 1994
		// hot-wire value 0.102, from memory).
		S:  0.10,
		X0: 4,
		// KT = 5.4: upper end of 5.0–5.4 (Franquet et al. 2015 Eq. 58).
		KT: 5.4,
		// λ = 1.3: upper end of 1.1–1.3 (Chen & Rodi 1980 gives 1.28).
		Lambda: 1.3,
		// Measured subsonic cores span 4–7 D; never assume less than 7 Dj
		// for a clearance (SUGGESTION of the project's reference sheet).
		CoreMin:    7,
		HeatedCore: false,
		// σ = 9.8: the low end of 9.8–13.5 (Görtler 1942 with Reichardt's
		// data, from memory), i.e. the widest mixing layer.
		Sigma:  9.8,
		Growth: 0.181,
		// 1.15: the middle of the 1.1–1.2 radial factor for thresholds
		// below 10 % of Uc (SUGGESTION, from the tail of Hussein, Capp &
		// George 1994 Table 4).
		Tail: 1.15,
		// S_p = 0.11 and K_u = 2.6: the wide and slow ends of the plane-jet
		// scatter (Heskestad 1965, from memory).
		PlaneS: 0.11,
		PlaneK: 2.6,
		// the whole exit momentum and excess-enthalpy flux is given to the
		// mean flow (conservation laws; the 5–10 % that turbulence carries
		// in a real jet is added to the mean, which only widens the zone)
		FluxFloor: 1,
		// the slow end of the pipe-jet scatter, 6.6 (from memory), and the
		// scalar constant scaled alike (SUGGESTION)
		PipeB:  6.6,
		PipeKT: 5.4 * 6.6 / 6.2,
		// Φ + 0.1: the upper end of the data scatter about the Dimotakis
		// fit for Mc ≳ 0.5 (the project's reference sheet §7, from memory)
		GrowthScatter: 0.1,
		Continuous:    true,
	}
}
