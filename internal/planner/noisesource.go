package planner

import (
	"arcwright/internal/acoustics"
	"arcwright/internal/jet"
	"strings"
)

// JetNoiseSource predicts the noise of plume p in atm over the default
// bands, and returns the axial positions of its source, m downstream of
// the nozzle exit on the jet axis.
//
// A single-stream jet is predicted from its fully expanded exit state
// ([NoiseJet]) and radiates from the end of its nominal potential core. A
// coaxial jet is not predicted as its fully mixed equivalent alone, which
// is a lower bound for separate-flow jets, but as the bound of
// [acoustics.NewCoaxialSource]: band by band the larger of the mixed jet
// and the energy sum of its two streams each predicted alone
// ([jet.StreamExits]), with a wider stated uncertainty and a note. It has
// two candidate source positions, the end of the mixed jet's nominal core
// and the end of the primary stream's own (shorter) one; a level is the
// larger of the two (the primary's core in the coaxial jet lies between
// them: co-flow lengthens it, common practice), so that a coaxial jet is
// never predicted quieter than its primary stream alone at any receiver.
func JetNoiseSource(p *jet.Plume, atm acoustics.Atmosphere) (*acoustics.NoiseSource, []float64, error) {
	mixed := NoiseJet(p.Exit())
	xs := []float64{p.CoreLength(jet.Nominal)}
	if p.Nozzle().Kind != jet.Coaxial {
		s, err := acoustics.NewNoiseSource(mixed, atm, acoustics.NoiseBands(mixed))
		return s, xs, err
	}
	pn, pc, _, _, err := jet.SeparateStreams(p.Nozzle(), p.Condition())
	if err != nil {
		return nil, nil, err
	}
	pp, err := jet.NewPlume(pn, pc, p.Limits())
	if err != nil {
		return nil, nil, err
	}
	_, se, err := jet.StreamExits(p.Nozzle(), p.Condition())
	if err != nil {
		return nil, nil, err
	}
	prim, sec := NoiseJet(pp.Exit()), NoiseJet(se)
	if x := pp.CoreLength(jet.Nominal); x != xs[0] {
		xs = append(xs, x)
	}
	s, err := acoustics.NewCoaxialSource(mixed, prim, sec, atm, acoustics.NoiseBands(mixed, prim, sec))
	return s, xs, err
}

// slowJetWarnings returns a warning for each single-stream point whose
// jet is outside the ARP 876 tables (Uj/c0 below 0.40 or above 2.51): its
// levels are extrapolated. The source's stated uncertainty already
// includes the widening for it.
func (ck *checker) slowJetWarnings() []string {
	var w []string
	for k, s := range ck.noise.sources {
		if s == nil || s.Coaxial() {
			continue
		}
		for _, n := range s.Notes() {
			if strings.HasPrefix(n, "Uj/c0") {
				w = append(w, ck.points[k].Name+": "+n+" Its levels are extrapolated beyond the model's data; their stated uncertainty is widened for it, and is itself a guess there.")
			}
		}
	}
	return w
}

// coaxialNoiseWarnings returns the plan's warning that its coaxial points'
// levels are the bound of [JetNoiseSource], naming the points; nil when
// there is none.
func (ck *checker) coaxialNoiseWarnings() []string {
	var names []string
	note := ""
	for k, s := range ck.noise.sources {
		if s.Coaxial() {
			names = append(names, ck.points[k].Name)
			note = s.Notes()[0]
		}
	}
	if names == nil {
		return nil
	}
	return []string{joinWords(names) + ": " + note}
}
