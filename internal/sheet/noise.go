package sheet

import (
	"fmt"
	"math"
	"strconv"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// The noise contours and crew positions on the plan, and the level and crew
// tables. The contours come from planner.Plan.NoiseMap: this file only
// draws them.

// noiseCaution is the caution printed with every noise output.
const noiseCaution = "The levels are estimates (SAE ARP 876 with Tam's similarity spectra; about ±3 dB on OASPL at best, more near the jet axis and for shock-containing jets). Hearing protection and exclusion zones follow the facility's procedures, local codes and licensed practice."

// noiseLabel is a contour label waiting for room on the plan.
type noiseLabel struct {
	text   string
	anchor Pt
}

// noiseContours draws the noise contours and the crew positions and notes
// what the contours cannot show. It returns the labels to place once the
// stations are labelled.
func (v *planView) noiseContours() []noiseLabel {
	b := v.b
	var clip []Pt
	if c := &b.req.Cell; b.walled() {
		clip = v.ringPts(orbPts(c.Boundary))
	}
	if b.noiseErr != nil {
		v.notes = append(v.notes, "Noise contours not drawn: "+b.noiseErr.Error()+".")
	}
	var labels []noiseLabel
	if m := b.noise; m != nil {
		at := fmt.Sprintf("point %s, %s above the %s", m.Point, b.pr.length(m.Height), b.ground())
		for _, c := range m.Contours {
			style := StyleNoiseA
			if c.Peak {
				style = StyleNoisePeak
			}
			longest, best := -1, 0
			for i, l := range c.Lines {
				pts := make([]Pt, len(l))
				for k, q := range l {
					pts[k] = v.t.pt(q[0], q[1])
				}
				sh := line(style, pts...)
				sh.Clip = clip
				v.shapes = append(v.shapes, sh)
				if len(l) > best {
					longest, best = i, len(l)
				}
			}
			switch {
			case longest >= 0:
				q := c.Lines[longest][len(c.Lines[longest])/2]
				labels = append(labels, noiseLabel{text: c.Label(), anchor: v.t.pt(q[0], q[1])})
			case c.Everywhere:
				v.notes = append(v.notes, fmt.Sprintf("Noise: above %s everywhere on the plan (%s).", c.Label(), at))
			default:
				v.notes = append(v.notes, fmt.Sprintf("Noise: below %s everywhere on the plan (%s).", c.Label(), at))
			}
		}
	}
	for _, c := range b.req.Crew {
		p := v.t.pt(c.At.X, c.At.Y)
		const r = 1.0
		v.shapes = append(v.shapes, poly(StyleCrew, []Pt{{p.X - r, p.Y - r}, {p.X + r, p.Y - r}, {p.X + r, p.Y + r}, {p.X - r, p.Y + r}}))
		v.pl.block(Rect{p.X - r, p.Y - r, 2 * r, 2 * r})
		labels = append(labels, noiseLabel{text: c.Name, anchor: p})
	}
	return labels
}

// noiseFar lets a contour or crew label step off the hatch or a crowded
// spot on a short leader.
var noiseFar = []float64{3}

// placeNoiseLabels places the contour and crew labels where there is room.
func (v *planView) placeNoiseLabels(ls []noiseLabel) {
	for _, l := range ls {
		if !v.placeText(l.text, FeatureLabel, "noise", sizeSmall, l.anchor, Pt{0, -1}, 1.2, noiseFar) {
			v.notes = append(v.notes, l.text+": no room for its label on the plan.")
		}
	}
}

// levelTable returns the predicted levels at every microphone, per
// operating point.
func (b *builder) levelTable() tableSpec {
	t := tableSpec{
		name:  "levels",
		title: "PREDICTED LEVELS AT THE MICROPHONES — OASPL, A-weighted level and C-weighted peak estimate (the C-weighted level plus a crest factor of 12 dB for subsonic shock-free jets, 15 dB otherwise) per operating point; the microphone check of the loudest (level plus a 15 dB crest allowance against the microphone's limit). " + noiseCaution,
		heads: []string{"ID"},
	}
	for _, p := range b.plan.Points {
		t.heads = append(t.heads, p.Name+" OASPL / dB(A) / peak")
	}
	t.heads = append(t.heads, "±", "Microphone")
	n := len(t.heads)
	t.right = make([]bool, n)
	t.flex = make([]bool, n)
	for i := 1; i < n-1; i++ {
		t.right[i] = true
	}
	t.flex[n-1] = true
	for i := range b.plan.Stations {
		s := &b.plan.Stations[i]
		c, ok := s.Check(planner.CheckLevel)
		if !ok || len(s.Levels) != len(b.plan.Points) {
			continue
		}
		row := []string{s.ID}
		unc := 0.0
		for _, l := range s.Levels {
			if math.IsNaN(l.OASPL) {
				row = append(row, "not predicted")
				continue
			}
			row = append(row, fmt.Sprintf("%.0f / %.0f / %.0f", l.OASPL, l.AWeighted, l.Peak))
			unc = max(unc, l.Uncertainty)
		}
		row = append(row, strconv.FormatFloat(unc, 'f', 0, 64)+" dB", c.Verdict.String()+": "+c.Reason)
		t.rows = append(t.rows, row)
	}
	return t
}

// crewTable returns the crew positions' exposure per operating point.
func (b *builder) crewTable() tableSpec {
	t := tableSpec{
		name: "crew",
		title: "CREW POSITIONS — predicted exposure per operating point against EU 2003/10/EC (action 80 and 85 dB(A), 135 and 137 dB(C) peak; limit 87 dB(A) and 140 dB(C) peak) and the NIOSH REL (85 dB(A) over 8 h, 3-dB exchange). " +
			noiseCaution,
		heads: []string{"Position", "X", "Y", "Point", "dB(A)", "Peak dB(C)", "Hours", "NIOSH allows", "Status", "Reason"},
		right: []bool{false, true, true, false, true, true, true, true, false, false},
		flex:  []bool{false, false, false, false, false, false, false, false, false, true},
	}
	for _, e := range b.plan.Crew {
		status := e.Status.String()
		switch {
		case e.InZone:
			status = "KEEP OUT"
		case e.Status == planner.Blocked:
			status = "LIMIT"
		}
		t.rows = append(t.rows, []string{e.Name, b.pr.cell(e.At.X), b.pr.cell(e.At.Y), e.Point, fmt.Sprintf("%.0f", e.AWeighted), fmt.Sprintf("%.0f", e.Peak),
			strconv.FormatFloat(e.Hours, 'g', 3, 64), units.FormatHours(e.AllowedHours), status, e.Reason})
	}
	return t
}
