// Package jet predicts the mean flow of a jet exhaust: the fully expanded
// exit state of the nozzle, the potential core and the mixing layer, the decay
// of centreline velocity and temperature in the developed region, and the
// closed zones where the mean velocity or temperature is above a limit.
//
// Everything inside is SI: metres, seconds, kelvin, pascals, kg/m³. The jet
// frame has its origin at the centre of the nozzle exit, x downstream along
// the axis and r the distance from the axis.
//
// # Models and constants
//
// Each correlation names its published source beside its constant. Two sets
// of constants are provided: [NominalModel] uses central values of the published
// scatter and is what tables print; [Conservative] uses the end of the scatter
// that makes a zone bigger ([ConservativeModel]), and is what clearance envelopes use. Where a
// constant was recalled rather than read in a stored copy of its source, its
// comment says "from memory".
//
// The flow field is built from three pieces that join continuously:
//
//   - a potential core of radius rc(x) that closes linearly at the end of the
//     core (Lau, Morris & Fisher 1979 length, with Witze's 1974 density
//     exponent for heated jets);
//   - a shoulder around it whose width grows with the mixing layer
//     (Brown & Roshko 1974 density form, Papamoschou & Roshko 1988
//     compressibility reduction, Dimotakis 1991 fit);
//   - a self-similar far field with a Gaussian profile, centreline velocity
//     falling as 1/x on the Thring & Newby 1953 effective diameter
//     (Hussein, Capp & George 1994 constants) and the excess total temperature
//     as a passive scalar (Chen & Rodi 1980).
//
// Low-Reynolds-number jets use the laminar similarity solutions of
// Schlichting (1933, round) and Bickley (1937, plane) instead; the switch is
// on Uj·D_eff over the ambient air's viscosity, which the mixed jet has.
//
// # Flux consistency
//
// A free jet at ambient pressure carries its exit momentum flux and its
// excess-enthalpy (mixture-fraction) flux unchanged. The conservative
// field is widened wherever its spreading law falls short of carrying the
// whole of both, computed with the field's own density (flux.go); its
// shoulder keeps growing at the far-field rate from its end-of-core width,
// and its mixing layer takes the upper end of the compressibility
// reduction's scatter (Φ + 0.1). A property test checks both fluxes and the
// monotone outline over NPR 1.05–5, T0/Ta 1–4 and every nozzle kind. A pipe
// exit (Nozzle.Contour) decays more slowly (B 6.4 nominal, 6.6 conservative,
// from memory).
//
// # Bent and attached zones
//
// [Plume.Bent] integrates the path of a buoyant jet whose zones reach past
// the onset of buoyancy: a top-hat integral model (Morton, Taylor & Turner
// 1956, any direction, non-Boussinesq), entrainment α = 0.08 (Ricou &
// Spalding 1961) for the path and centreline values, widths widened toward
// the plume's α = 0.12 as the path turns up, the rise's ±30 % scatter
// added to the radius, and never narrower than the straight zone at the
// same distance along the path. [Plume.WallJet] and [Plume.RadialJet] carry
// a zone on along a surface it reaches: a three-dimensional wall jet
// (spreading 0.32 along and 0.05 away from the surface, Launder & Rodi 1983,
// from memory) or a radial wall jet over a surface across the jet (decay
// constants derived from the arriving fluxes with δ½ = 0.085 r). Both are
// predictions with a wider scatter than the free jet's.
//
// # Envelopes
//
// [Plume.VelocityEnvelope] and [Plume.HotEnvelope] return the closed zone in
// (x, r) where the mean velocity or the total temperature exceeds a limit. An
// envelope of the conservative model is never smaller than the nominal one at
// any x: its radius is the largest of the conservative field's contour, the
// nominal field's contour and a mixing-layer edge drawn from the nozzle lip,
// times a radial factor for the non-Gaussian tail. Mean values are not peak
// values: turbulence carries instantaneous velocities well above the mean, and
// the user's margin is added on top of the envelope by the planner.
//
// # Regimes
//
// [Plume.Flags] reports, each with a reason in words, jets that are laminar,
// buoyancy-affected, shock-containing, or outside the fitted range of a
// correlation. The model warns and carries on; it never extrapolates silently.
package jet
