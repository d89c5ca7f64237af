package sheet

import (
	"github.com/paulmach/orb"
	"math"
	"strconv"
	"strings"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// Leader distances, mm beyond the mark, tried in turn when a label has no
// room beside its mark.
var (
	idFar     = []float64{2.5, 5, 8, 12, 17}
	numberFar = []float64{2, 4, 7, 10, 14}
	featFar   = []float64{2.5, 5, 9, 14, 20}
)

// labelBox returns the size of a label box for s at size (pt), mm.
func (b *builder) labelBox(s string, size float64) (float64, float64) {
	return b.m.width(s, size, false) + 0.8, capHeight(size) + 1.0
}

// placeText places one label and records it; it reports whether there was
// room.
func (v *planView) placeText(s string, kind LabelKind, of string, size float64, anchor, dir Pt, clear float64, far []float64) bool {
	s = clean(s)
	w, h := v.b.labelBox(s, size)
	sp, ok := v.pl.find(want{w: w, h: h, anchor: anchor, clear: clear, dir: dir}, far)
	if !ok {
		return false
	}
	v.pl.commit(sp)
	if sp.offHatch && kind == StationLabel {
		if v.offHatch == nil {
			v.offHatch = map[string]bool{}
		}
		v.offHatch[of] = true
	}
	v.labels = append(v.labels, Label{
		Text: s, Kind: kind, For: of, X: sp.box.X, Y: sp.box.Y, W: sp.box.W, H: sp.box.H,
		Size: size, Anchor: anchor, Leader: sp.leader, Line: leaderLine(sp), View: v.viewName(),
	})
	return true
}

// placeLabels places every label of the plan, most important first:
// station IDs beside their marks, the dimension callouts, station IDs on
// leaders, the features' names, key numbers for the stations still without
// a label, then angle and zone labels where room is left.
func (v *planView) placeLabels(z zoneSet) {
	b := v.b
	st := b.plan.Stations
	dirs := make([]Pt, len(st))
	for i := range st {
		dirs[i] = v.labelDir(&st[i])
	}
	done := make([]bool, len(st))
	clear := v.markR + 0.2
	// crowded stations get smaller IDs
	v.idSize = sizeID
	if v.markR < 0.9 {
		v.idSize = sizeNumber + 0.3
	}
	for i := range st {
		done[i] = v.placeText(st[i].ID, StationLabel, st[i].ID, v.idSize, v.pos[&st[i]], dirs[i], clear, nil)
	}
	// the hazards next: a safety mark must say what it marks
	for _, c := range v.hazardLabels {
		if !v.placeText(c.text, c.kind, c.of, sizeSmall, c.anchor, c.dir, c.clear, c.far) {
			v.notes = append(v.notes, c.note)
		}
	}
	for _, c := range v.callouts {
		if !v.placeText(c.text, c.kind, c.of, sizeSmall, c.anchor, c.dir, c.clear, c.far) {
			n := c.note
			if n == "" {
				n = c.text
			}
			v.notes = append(v.notes, n+" (no room on the plan).")
		}
	}
	for i := range st {
		if !done[i] {
			done[i] = v.placeText(st[i].ID, StationLabel, st[i].ID, v.idSize, v.pos[&st[i]], dirs[i], clear, idFar)
		}
	}
	v.featureLabels()
	number := func(i int, far []float64) bool {
		n := len(b.model.Key) + 1
		if v.placeText(strconv.Itoa(n), NumberLabel, st[i].ID, sizeNumber, v.pos[&st[i]], dirs[i], clear, far) {
			b.model.Key = append(b.model.Key, KeyEntry{Number: n, ID: st[i].ID})
			return true
		}
		return false
	}
	for i := range st {
		if !done[i] {
			done[i] = number(i, nil)
		}
	}
	v.rangeLabels(done, dirs)
	for i := range st {
		if !done[i] && !number(i, numberFar) {
			b.model.Unlabelled = append(b.model.Unlabelled, st[i].ID)
		}
	}
	for _, c := range v.angles {
		v.placeText(c.text, c.kind, c.of, sizeSmall, c.anchor, c.dir, c.clear, nil)
	}
	v.zoneLabels(z)
}

// rangeLabels labels each run of two or more neighbouring stations of an
// array that are still without a label with one range label
// "first…last" beside the run's middle station, and marks them done.
func (v *planView) rangeLabels(done []bool, dirs []Pt) {
	b := v.b
	st := b.plan.Stations
	index := make(map[*planner.Station]int, len(st))
	for i := range st {
		index[&st[i]] = i
	}
	for _, ar := range b.plan.Arrays {
		ss := b.byArray[ar.Name]
		for lo := 0; lo < len(ss); {
			if done[index[ss[lo]]] {
				lo++
				continue
			}
			hi := lo
			for hi+1 < len(ss) && !done[index[ss[hi+1]]] {
				hi++
			}
			if hi > lo {
				mid := index[ss[(lo+hi)/2]]
				txt := ss[lo].ID + "…" + ss[hi].ID
				if v.placeText(txt, RangeLabel, txt, v.idSize, v.pos[&st[mid]], dirs[mid], v.markR+0.2, idFar) {
					if b.ranges == "" {
						b.ranges = txt
					}
					for k := lo; k <= hi; k++ {
						done[index[ss[k]]] = true
					}
				}
			}
			lo = hi + 1
		}
	}
}

// labelDir returns the preferred direction of a station's label on the
// page: away from the arc or ring centre, away from the axis for lines, and
// away from the nozzle exit otherwise.
func (v *planView) labelDir(s *planner.Station) Pt {
	b := v.b
	p := v.pos[s]
	var from Pt
	ar := b.array(s.Array)
	fr := b.req.Exit
	switch {
	case ar != nil && (ar.Kind == planner.Arc || ar.Kind == planner.Ring):
		from = v.t.pt(ar.Centre.X, ar.Centre.Y)
	case ar != nil && (ar.Kind == planner.Line || ar.Kind == planner.NearField):
		f := fr.ToCell(geometry.JetPoint{X: s.Jet.X})
		from = v.t.pt(f.X, f.Y)
	default:
		from = v.t.pt(fr.Exit.X, fr.Exit.Y)
	}
	return unit(sub(p, from), unit(Pt{1, -1}, Pt{1, 0}))
}

// array returns the array result named name, nil if none.
func (b *builder) array(name string) *planner.ArrayResult {
	for i := range b.plan.Arrays {
		if b.plan.Arrays[i].Name == name {
			return &b.plan.Arrays[i]
		}
	}
	return nil
}

// featureLabels names the datum, the floor marks, the obstacles, keep-out
// zones, the collector and the nozzle.
func (v *planView) featureLabels() {
	b := v.b
	pr := b.pr
	c := &b.req.Cell
	diag := unit(Pt{1, -1}, Pt{1, 0})
	if !v.datumOut && !v.placeText("DATUM (0, 0)", FeatureLabel, "datum", sizeSmall, v.t.pt(0, 0), unit(Pt{-1, 1}, Pt{1, 0}), 2.3, featFar) {
		v.notes = append(v.notes, "The datum symbol marks (0, 0).")
	}
	for _, m := range c.Marks {
		v.placeText("mark "+m.Name, FeatureLabel, m.Name, sizeSmall, v.t.pt(m.At[0], m.At[1]), diag, 1.6, featFar)
	}
	for _, o := range c.Obstacles {
		bd := o.Footprint.Bound()
		p := v.t.pt((bd.Min[0]+bd.Max[0])/2, (bd.Min[1]+bd.Max[1])/2)
		v.placeText(o.Name, FeatureLabel, o.Name, sizeSmall, p, Pt{0, -1}, 0, featFar)
	}
	for _, k := range c.KeepOuts {
		bd := k.Footprint.Bound()
		p := v.t.pt((bd.Min[0]+bd.Max[0])/2, (bd.Min[1]+bd.Max[1])/2)
		v.placeText("keep-out: "+k.Name, FeatureLabel, k.Name, sizeSmall, p, Pt{0, -1}, 0, featFar)
	}
	if col := c.Collector; col != nil {
		// beside the end of the inlet's line on its left
		s, co := math.Sincos(col.Heading)
		p := v.t.pt(col.Inlet.X-s*col.Diameter/2, col.Inlet.Y+co*col.Diameter/2)
		v.placeText("collector inlet Ø "+pr.dim(col.Diameter), FeatureLabel, "collector", sizeSmall, p, Pt{-s, -co}, 0.5, featFar)
	}
	fr := b.req.Exit
	e := v.t.pt(fr.Exit.X, fr.Exit.Y)
	s, co := math.Sincos(fr.Heading)
	txt := "nozzle exit: X " + pr.dim(fr.Exit.X) + ", Y " + pr.dim(fr.Exit.Y) + ", axis " + pr.dim(fr.Exit.Z) + " above the " + b.ground()
	if !v.placeText(txt, FeatureLabel, "nozzle", sizeSmall, e, Pt{-s, -co}, 1.5, []float64{3, 6, 10, 15, 22, 30, 40, 55}) {
		v.notes = append(v.notes, txt+".")
	}
}

// zoneLabels names the velocity and hot zones beside their edges and notes
// where the zones run out of the frame.
func (v *planView) zoneLabels(z zoneSet) {
	b := v.b
	pr := b.pr
	fr := b.req.Exit
	edge := func(out zoneOutline, x float64) (Pt, Pt, bool) {
		r := 0.0
		for i := 0; i+1 < len(out); i++ {
			a, c := out[i], out[i+1]
			if x >= a[0] && x <= c[0] && c[0] > a[0] {
				r = a[1] + (x-a[0])/(c[0]-a[0])*(c[1]-a[1])
				break
			}
		}
		p3 := fr.ToCell(geometry.JetPoint{X: x, R: r})
		q3 := fr.ToCell(geometry.JetPoint{X: x, R: r + 1})
		p, q := v.t.pt(p3.X, p3.Y), v.t.pt(q3.X, q3.Y)
		inside := p.X > v.frame.X+3 && p.X < v.frame.Right()-3 && p.Y > v.frame.Y+3 && p.Y < v.frame.Bottom()-3
		return p, unit(sub(q, p), Pt{0, -1}), inside
	}
	for _, zz := range []struct {
		out  zoneOutline
		l    float64
		text string
		of   string
	}{
		{z.vel, z.velLen, "velocity zone: mean velocity > " + pr.speed(b.lim.Velocity), "velocity zone"},
		{z.hot, z.hotLen, b.hotName() + ": total temperature > " + pr.temp(b.lim.Temperature), "hot zone"},
	} {
		if zz.out == nil {
			continue
		}
		for _, f := range []float64{0.3, 0.5, 0.2, 0.7, 0.12, 0.85} {
			p, d, ok := edge(zz.out, f*zz.l)
			if ok && v.placeText(zz.text, FeatureLabel, zz.of, sizeSmall, p, d, 0.5, []float64{2, 4, 7}) {
				break
			}
		}
	}
	// zones cut at the walls of a walled cell, or running out of the frame
	// of an open cell or an outdoor pad (whose site limit is not a wall)
	cell := &v.b.req.Cell
	var beyond []string
	for _, zz := range []struct {
		out  zoneOutline
		name string
		l    float64
	}{{z.velM, "velocity zone", z.velLen}, {z.hotM, "hot zone", z.hotLen}} {
		if zz.out == nil {
			continue
		}
		for _, q := range planRing(fr, zz.out) {
			p := v.t.pt(q[0], q[1])
			out := p.X < v.frame.X || p.X > v.frame.Right() || p.Y < v.frame.Y || p.Y > v.frame.Bottom()
			if v.b.walled() {
				out = !cell.Contains(orb.Point{q[0], q[1]})
			}
			if out {
				beyond = append(beyond, zz.name+" to "+pr.length(zz.l)+" from the exit")
				break
			}
		}
	}
	if len(beyond) == 0 {
		return
	}
	if v.b.walled() {
		then := " See the plan's warnings where a zone meets a wall."
		if len(v.b.plan.Impingements) == 0 && len(v.b.plan.Attached) == 0 {
			// the planner finds no wall contact (a collector takes the jet
			// first): say so rather than point to warnings that are not there
			then = " By the planner's checks no zone meets a wall, floor or ceiling before it is captured; the checks use the whole zone."
		}
		v.notes = append(v.notes, "The zones are drawn up to the boundary; as free jets they would reach: "+joinAnd(beyond)+" (plus the margin)."+then)
		return
	}
	txt := "zones continue beyond the frame: " + joinAnd(beyond)
	v.notes = append(v.notes, "The "+txt+" (plus the margin).")
	// where the axis leaves the frame
	e := v.t.pt(fr.Exit.X, fr.Exit.Y)
	s, c := math.Sincos(fr.Heading)
	d := Pt{c, -s}
	t := math.Inf(1)
	if d.X > 1e-9 {
		t = math.Min(t, (v.frame.Right()-e.X)/d.X)
	} else if d.X < -1e-9 {
		t = math.Min(t, (v.frame.X-e.X)/d.X)
	}
	if d.Y > 1e-9 {
		t = math.Min(t, (v.frame.Bottom()-e.Y)/d.Y)
	} else if d.Y < -1e-9 {
		t = math.Min(t, (v.frame.Y-e.Y)/d.Y)
	}
	if math.IsInf(t, 1) || t < 0 {
		return
	}
	at := add(e, mul(d, t-4))
	v.placeText(txt+" >>", FeatureLabel, "zones beyond", sizeSmall, at, Pt{-d.Y, d.X}, 1, []float64{2, 5, 9, 14, 20})
}

// joinAnd joins words as "a", "a and b", "a, b and c".
func joinAnd(s []string) string { return joinWith(s, "and") }

// joinWith joins words with commas and the conjunction before the last.
func joinWith(s []string, conj string) string {
	switch len(s) {
	case 0:
		return ""
	case 1:
		return s[0]
	}
	return strings.Join(s[:len(s)-1], ", ") + " " + conj + " " + s[len(s)-1]
}
