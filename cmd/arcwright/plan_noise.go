package main

import (
	"fmt"
	"io"
	"math"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// planNoiseText prints the predicted levels by array and the crew
// positions' exposure, with the caution.
func planNoiseText(w io.Writer, p *planner.Plan) {
	type span struct {
		lo, hi *planner.Station
		loL    float64
		hiL    planner.Level
	}
	var order []string
	spans := map[string]*span{}
	for i := range p.Stations {
		s := &p.Stations[i]
		c, ok := s.Check(planner.CheckLevel)
		if !ok || len(s.Levels) == 0 || math.IsNaN(c.Value) {
			continue
		}
		var loud planner.Level
		for _, l := range s.Levels {
			if l.Point == c.Point {
				loud = l
			}
		}
		sp := spans[s.Array]
		if sp == nil {
			sp = &span{lo: s, hi: s, loL: c.Value, hiL: loud}
			spans[s.Array] = sp
			order = append(order, s.Array)
		}
		if c.Value < sp.loL {
			sp.lo, sp.loL = s, c.Value
		}
		if c.Value > sp.hiL.OASPL {
			sp.hi, sp.hiL = s, loud
		}
	}
	if len(order) > 0 {
		fmt.Fprintf(w, "\nPredicted levels at the microphones (loudest point; %s)\n", "SAE ARP 876 with Tam's spectra")
		tw := newTable(w, 0)
		fmt.Fprintln(tw, "  array\tOASPL\tloudest station\tdB(A)\tpeak dB(C)\t±\t")
		for _, a := range order {
			sp := spans[a]
			fmt.Fprintf(tw, "  %s\t%.0f–%.0f dB\t%s (%s)\t%.0f\t%.0f\t%.0f dB\t\n", a, sp.loL, sp.hiL.OASPL, sp.hi.ID, sp.hiL.Point, sp.hiL.AWeighted, sp.hiL.Peak, sp.hiL.Uncertainty)
		}
		tw.Flush()
	}
	if len(p.Crew) > 0 {
		fmt.Fprintln(w, "\nCrew positions (EU 2003/10/EC action 80/85 dB(A) and 135/137 dB(C) peak, limit 87 dB(A) and 140 dB(C) peak; NIOSH 85 dB(A), 3-dB exchange)")
		tw := newTable(w, 0)
		fmt.Fprintln(tw, "  position\tpoint\tdB(A)\tpeak dB(C)\thours\tNIOSH allows\tstatus\t")
		for _, e := range p.Crew {
			status := e.Status.String()
			if e.InZone {
				status += ": in a zone, no one may stand here during runs"
			}
			fmt.Fprintf(tw, "  %s\t%s\t%.0f\t%.0f\t%.3g h\t%s\t%s\t\n", e.Name, e.Point, e.AWeighted, e.Peak, e.Hours, units.FormatHours(e.AllowedHours), status)
		}
		tw.Flush()
	}
	if len(order) > 0 || len(p.Crew) > 0 {
		fmt.Fprintln(w, "  "+noiseCaution)
	}
}
