package sheet

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/paulmach/orb"

	"arcwright/internal/planner"
)

// detail is an enlarged view of an array too dense to label at the plan's
// scale: its letter, the array, the cell-frame rectangle it shows and its
// scale.
type detail struct {
	letter string
	array  string
	ext    orb.Bound
	scale  int
}

// Detail views, mm: the largest frame, the spacing of neighbouring
// stations below which an array is dense on the plan, and the spacing a
// detail must reach to be worth drawing.
const (
	detailMaxW   = 185.0
	detailMaxH   = 95.0
	denseMM      = 5.0
	detailMinGap = 5.0
)

// maxDetails is the most detail views a sheet set draws.
const maxDetails = 12

// detailLetter returns the letter of the i-th detail: A … Z.
func detailLetter(i int) string { return string(rune('A' + i)) }

// boundOfStations returns the plan rectangle of the stations' microphones
// and bases, m.
func boundOfStations(ss []*planner.Station) orb.Bound {
	bd := orb.Bound{Min: orb.Point{ss[0].Mic.X, ss[0].Mic.Y}, Max: orb.Point{ss[0].Mic.X, ss[0].Mic.Y}}
	for _, s := range ss {
		bd = bd.Extend(orb.Point{s.Mic.X, s.Mic.Y}).Extend(s.Base)
	}
	return bd
}

// detailFits reports whether the rectangle bd (m), padded as a detail is,
// fits a detail frame at 1:scale.
func detailFits(bd orb.Bound, scale int) bool {
	w, h := bd.Max[0]-bd.Min[0], bd.Max[1]-bd.Min[1]
	p := 2 * math.Max(0.06*math.Max(w, h), 0.3)
	return fits(w+p, h+p, detailMaxW-2*viewPad, detailMaxH-2*viewPad, scale)
}

// findDetails returns the detail views of the plan: one for each array
// whose neighbouring stations lie less than denseMM apart on the plan or
// some of whose stations got no ID right beside them (none, or one on a
// leader for want of room rather than to keep off the hatch), when a
// standard scale at least 1.5 times the plan's shows the array in a detail
// frame with its stations at least detailMinGap apart. It draws each detail's outline on
// the plan with its letter.
func (v *planView) findDetails() []detail {
	b := v.b
	// an ID that went on a leader to keep off the hatch beside its mark
	// needs no detail: the hatch grows with the scale, and the detail
	// would only repeat the leader
	labelled := map[string]bool{}
	for _, l := range v.labels {
		if l.Kind == StationLabel && (!l.Leader || v.offHatch[l.For]) {
			labelled[l.For] = true
		}
	}
	list := scalesFor(b.req.Units)
	type cand struct {
		d     detail
		need  int
		order int
	}
	var cands []cand
	var out []detail
	for i := range b.plan.Arrays {
		ar := &b.plan.Arrays[i]
		ss := b.byArray[ar.Name]
		if len(ss) < 3 {
			continue
		}
		var gaps []float64
		missing := false
		for k, s := range ss {
			missing = missing || !labelled[s.ID]
			if k > 0 {
				gaps = append(gaps, dist(v.pos[s], v.pos[ss[k-1]]))
			}
		}
		sort.Float64s(gaps)
		gap := gaps[len(gaps)/2] // mm at the plan's scale
		if gap >= denseMM && !missing {
			continue
		}
		// the largest drawing that spaces the stations detailMinGap apart
		// without being pointlessly close to the plan's scale
		chosen := 0
		for _, sc := range list {
			if float64(sc)*1.5 > float64(v.scale) {
				break
			}
			if gap*float64(v.scale)/float64(sc) >= detailMinGap {
				chosen = sc
			}
		}
		if chosen == 0 {
			continue
		}
		// the array in runs of neighbouring stations, each as long as a
		// detail frame holds at that scale
		for start := 0; start < len(ss); {
			end := start + 1
			run := boundOfStations(ss[start:end])
			for end < len(ss) {
				next := run.Extend(orb.Point{ss[end].Mic.X, ss[end].Mic.Y}).Extend(ss[end].Base)
				if !detailFits(next, chosen) {
					break
				}
				run, end = next, end+1
			}
			need := 0 // stations without an ID beside them
			for _, s := range ss[start:end] {
				if !labelled[s.ID] {
					need++
				}
			}
			if need > 0 {
				w, h := run.Max[0]-run.Min[0], run.Max[1]-run.Min[1]
				run = run.Pad(math.Max(0.06*math.Max(w, h), 0.3))
				what := "array " + ar.Name
				if start > 0 || end < len(ss) {
					what = ss[start].ID + " to " + ss[end-1].ID
				}
				cands = append(cands, cand{detail{array: what, ext: run, scale: chosen}, need, len(cands)})
			}
			start = end
		}
	}
	// the runs with the most stations still without an ID, in plan order
	sort.SliceStable(cands, func(i, j int) bool { return cands[i].need > cands[j].need })
	cands = cands[:min(len(cands), maxDetails)]
	sort.Slice(cands, func(i, j int) bool { return cands[i].order < cands[j].order })
	for _, c := range cands {
		d := c.d
		d.letter = detailLetter(len(out))
		out = append(out, d)
		// the outline on the plan and its letter
		a, e := v.t.pt(d.ext.Min[0], d.ext.Min[1]), v.t.pt(d.ext.Max[0], d.ext.Max[1])
		r := boundOf([]Pt{a, e})
		v.shapes = append(v.shapes, rectShape(StyleDetail, r))
		v.callout(d.letter, r)
	}
	if len(out) > 0 {
		v.notes = append(v.notes, fmt.Sprintf("%s: enlarged on the first sheet after this one.", plural(len(out), "detail")))
	}
	return out
}

// callout letters the outline r (page mm) of detail letter on the plan:
// "DETAIL E" beside its top-left corner where there is room, else beside
// another corner, else the letter alone beside a corner or just inside
// one, and where the plan is full even there, the letter just inside the
// top-left corner over what lies beneath: a detail sheet whose view the
// plan does not call out cannot be found from the plan.
func (v *planView) callout(letter string, r Rect) {
	of := "detail " + letter
	size := sizeSmall + 0.5
	corners := []struct{ at, dir Pt }{
		{Pt{r.X, r.Y}, unit(Pt{-1, -1}, Pt{0, -1})},
		{Pt{r.Right(), r.Y}, unit(Pt{1, -1}, Pt{0, -1})},
		{Pt{r.X, r.Bottom()}, unit(Pt{-1, 1}, Pt{0, 1})},
		{Pt{r.Right(), r.Bottom()}, unit(Pt{1, 1}, Pt{0, 1})},
	}
	for _, txt := range []string{"DETAIL " + letter, letter} {
		for _, c := range corners {
			if v.placeText(txt, FeatureLabel, of, size, c.at, c.dir, 0.5, featFar) {
				return
			}
		}
	}
	w, h := v.b.labelBox(letter, size)
	for _, c := range corners {
		in := Pt{c.at.X - c.dir.X*(w/2+0.6), c.at.Y - c.dir.Y*(h/2+0.6)}
		if v.placeText(letter, FeatureLabel, of, size, in, Pt{-c.dir.X, -c.dir.Y}, 0, nil) {
			return
		}
	}
	// the plan is full round the outline: the first spot along its edges,
	// inside or out, clear of every other label (over marks and lines if
	// need be), else just inside its top-left corner
	fr := v.frame.inset(0.8)
	clamp := func(x, y float64) Rect {
		return Rect{math.Max(fr.X, math.Min(x, fr.Right()-w)), math.Max(fr.Y, math.Min(y, fr.Bottom()-h)), w, h}
	}
	box := clamp(r.X+0.4, r.Y+0.4)
	free := func(c Rect) bool {
		for _, l := range v.labels {
			if l.Box().Overlaps(c, -0.3) {
				return false
			}
		}
		return true
	}
search:
	for off := 0.0; off <= 12; off += 1.5 {
		for _, c := range []Rect{
			clamp(r.X-w-0.4-off, r.Y-h-0.4), clamp(r.X+0.4+off, r.Y+0.4), clamp(r.X+off, r.Y-h-0.4),
			clamp(r.Right()-w-off, r.Y-h-0.4), clamp(r.Right()+0.4, r.Y+off), clamp(r.X-w-0.4, r.Y+off),
			clamp(r.X+off, r.Bottom()+0.4), clamp(r.Right()-w-0.4-off, r.Bottom()-h-0.4),
		} {
			if free(c) {
				box = c
				break search
			}
		}
	}
	v.pl.mark(box)
	// its anchor: the point of the outline nearest the letter
	at := Pt{math.Max(r.X, math.Min(box.X+w/2, r.Right())), math.Max(r.Y, math.Min(box.Y+h/2, r.Bottom()))}
	v.labels = append(v.labels, Label{Text: letter, Kind: FeatureLabel, For: of, X: box.X, Y: box.Y, W: w, H: h,
		Size: size, Anchor: at, View: v.viewName()})
}

// detailView draws detail d in the frame r: the plan's drawing at the
// detail's scale, with every station inside the frame labelled by its ID
// where there is room, and the angles of its arcs.
func (b *builder) detailView(d detail, r Rect) (*planView, []Label, []*planner.Station) {
	inner := r.inset(viewPad)
	cx, cy := (d.ext.Min[0]+d.ext.Max[0])/2, (d.ext.Min[1]+d.ext.Max[1])/2
	v := &planView{
		b: b, frame: r, name: "detail " + d.letter, scale: d.scale,
		t:   newTransform(d.scale, cx, cy, Pt{inner.X + inner.W/2, inner.Y + inner.H/2}),
		pl:  newPlacer(r.inset(0.8)),
		pos: make(map[*planner.Station]Pt),
	}
	v.grid()
	v.cell()
	v.drawZones(b.zs)
	v.nozzle()
	v.collector()
	// only the stations in or near the frame are drawn and labelled
	st := b.plan.Stations
	near := Rect{r.X - 5, r.Y - 5, r.W + 10, r.H + 10}
	var pts []Pt
	var here []*planner.Station
	for i := range st {
		p := v.t.pt(st[i].Mic.X, st[i].Mic.Y)
		v.pos[&st[i]] = p
		if p.X >= near.X && p.X <= near.Right() && p.Y >= near.Y && p.Y <= near.Bottom() {
			pts = append(pts, p)
			here = append(here, &st[i])
		}
	}
	v.markR = markRadius(pts)
	v.arrays()
	for _, s := range here {
		p := v.pos[s]
		base := v.t.pt(s.Base[0], s.Base[1])
		if s.Stand != nil && dist(base, p) > 0.3 {
			v.shapes = append(v.shapes, circle(StyleBase, base, math.Max(v.t.mm(s.Stand.BaseRadius), 0.4)), line(StyleBase, base, p))
		}
		v.shapes = append(v.shapes, markShapes(s.Status, p, v.markR)...)
		v.pl.mark(rectAround(p, v.markR*1.15))
	}
	v.floorMarks()
	v.pl.hatchFrom(v.shapes)
	in := r.inset(1)
	var shown []*planner.Station
	for _, s := range here {
		p := v.pos[s]
		if p.X < in.X || p.X > in.Right() || p.Y < in.Y || p.Y > in.Bottom() {
			continue
		}
		shown = append(shown, s)
		v.placeText(s.ID, StationLabel, s.ID, sizeID, p, v.labelDir(s), v.markR+0.2, idFar)
	}
	for _, c := range v.angles {
		v.placeText(c.text, c.kind, c.of, sizeSmall, c.anchor, c.dir, c.clear, nil)
	}
	return v, v.labels, shown
}

// shownRuns names the stations a detail shows, in plan order, neighbours
// of one array as a run: "A-01 to, R-08"; runs past what
// fits in w mm between lead and tail at the title's size are summed up as
// "and 24 more" (stations; the first run stays).
func (b *builder) shownRuns(ss []*planner.Station, w float64, lead, tail string) string {
	var runs []string
	var count []int // stations in each run
	for i := 0; i < len(ss); {
		j := i + 1
		for j < len(ss) && ss[j].Array == ss[i].Array && ss[j].Index == ss[j-1].Index+1 {
			j++
		}
		switch j - i {
		case 1:
			runs, count = append(runs, ss[i].ID), append(count, 1)
		case 2:
			runs, count = append(runs, ss[i].ID, ss[i+1].ID), append(count, 1, 1)
		default:
			runs, count = append(runs, ss[i].ID+" to "+ss[j-1].ID), append(count, j-i)
		}
		i = j
	}
	out := strings.Join(runs, ", ")
	for k := len(runs) - 1; k > 0 && b.m.width(clean(lead+out+tail), sizeBody, true) > w; k-- {
		n := 0
		for _, c := range count[k:] {
			n += c
		}
		out = strings.Join(runs[:k], ", ") + fmt.Sprintf(" and %d more", n)
	}
	return out
}

// detailTitleMin is the width a detail's title may take beside a narrower
// detail where the row has room, mm.
const detailTitleMin = 60.0

// detailTitle returns the lines of detail d's title within w mm: its
// letter, the stations it shows (shown; summed up where they would not fit
// on one line) and its scale, wrapped where even that is too wide.
func (b *builder) detailTitle(d detail, shown []*planner.Station, w float64) []string {
	lead := "DETAIL " + d.letter + " — "
	tail := ", scale " + ScaleName(d.scale, b.req.Units)
	what := d.array
	if len(shown) > 0 {
		what = b.shownRuns(shown, w, lead, tail)
	}
	return b.m.wrap(clean(lead+what+tail), w, sizeBody, true)
}

// details lays out the detail views on the flow's sheets, side by side
// where they fit, each with its title above it, within its width (or
// within detailTitleMin beside a narrow one, the next detail then
// starting after the title).
func (f *flow) details(ds []detail) {
	if len(ds) == 0 {
		return
	}
	b := f.b
	f.heading("DETAILS — arrays too dense to label at the plan's scale, enlarged; each is outlined and lettered on the plan", 40)
	x := f.area.X
	rowH := 0.0
	lh := lineHeight(sizeBody)
	for _, d := range ds {
		w := math.Min(detailMaxW, (d.ext.Max[0]-d.ext.Min[0])*1000/float64(d.scale)+2*viewPad)
		h := math.Min(detailMaxH, (d.ext.Max[1]-d.ext.Min[1])*1000/float64(d.scale)+2*viewPad)
		if x > f.area.X && x+w > f.area.Right() {
			x = f.area.X
			f.y += rowH + 3
			rowH = 0
		}
		// the title's lines depend on the stations the view shows, which
		// depend on the frame's size alone: lay the view out again in the
		// rare case the title needs more lines than assumed
		for lines := 1; ; {
			titleH := float64(lines)*lh + 1
			if f.room() < h+titleH {
				f.newPage()
				x, rowH = f.area.X, 0
			}
			tw := math.Max(w, math.Min(detailTitleMin, f.area.Right()-x))
			// the title names the stations the detail shows, which may be
			// more than the run it was drawn for
			v, labels, shown := b.detailView(d, Rect{x, f.y + titleH, w, h})
			tl := b.detailTitle(d, shown, tw)
			if len(tl) > lines {
				lines = len(tl)
				continue
			}
			used := w
			for i, s := range tl {
				f.page.Texts = append(f.page.Texts, Text{X: x, Y: f.y + capHeight(sizeBody) + 0.3 + float64(i)*lh, Size: sizeBody, Bold: true, Text: s})
				used = math.Max(used, b.m.width(s, sizeBody, true))
			}
			f.page.Views = append(f.page.Views, View{Name: v.viewName(), Frame: v.frame, Scale: d.scale, Shapes: cropShapes(v.shapes, v.frame)})
			f.page.Labels = append(f.page.Labels, labels...)
			x += used + 4
			rowH = math.Max(rowH, h+titleH)
			break
		}
	}
	f.y += rowH + 4
}

// cropShapes returns the shapes that reach into r, polygons cut to r
// grown by 1 mm (Sutherland–Hodgman, ring by ring), so that a detail view
// neither carries nor hatches the whole plan.
func cropShapes(shapes []Shape, r Rect) []Shape {
	g := Rect{r.X - 1, r.Y - 1, r.W + 2, r.H + 2}
	var out []Shape
	for _, sh := range shapes {
		bd := shapeBound(sh)
		if !bd.Overlaps(g, 0) && !g.Contains(bd) {
			continue
		}
		if sh.Kind == Polygon && !g.Contains(bd) {
			sh.Points = clipRing(sh.Points, g)
			if len(sh.Points) < 3 {
				continue
			}
			var holes [][]Pt
			for _, h := range sh.Holes {
				if c := clipRing(h, g); len(c) >= 3 {
					holes = append(holes, c)
				}
			}
			sh.Holes = holes
		}
		out = append(out, sh)
	}
	return out
}

// clipRing cuts the ring pts to the rectangle r (Sutherland–Hodgman).
func clipRing(pts []Pt, r Rect) []Pt {
	type edge struct {
		in  func(Pt) bool
		cut func(a, b Pt) Pt
	}
	lerpX := func(a, b Pt, x float64) Pt { return Pt{x, a.Y + (b.Y-a.Y)*(x-a.X)/(b.X-a.X)} }
	lerpY := func(a, b Pt, y float64) Pt { return Pt{a.X + (b.X-a.X)*(y-a.Y)/(b.Y-a.Y), y} }
	edges := []edge{
		{func(p Pt) bool { return p.X >= r.X }, func(a, b Pt) Pt { return lerpX(a, b, r.X) }},
		{func(p Pt) bool { return p.X <= r.Right() }, func(a, b Pt) Pt { return lerpX(a, b, r.Right()) }},
		{func(p Pt) bool { return p.Y >= r.Y }, func(a, b Pt) Pt { return lerpY(a, b, r.Y) }},
		{func(p Pt) bool { return p.Y <= r.Bottom() }, func(a, b Pt) Pt { return lerpY(a, b, r.Bottom()) }},
	}
	out := pts
	for _, e := range edges {
		in := out
		out = nil
		for i := range in {
			a, b := in[(i+len(in)-1)%len(in)], in[i]
			switch {
			case e.in(b) && !e.in(a):
				out = append(out, e.cut(a, b), b)
			case e.in(b):
				out = append(out, b)
			case e.in(a):
				out = append(out, e.cut(a, b))
			}
		}
		if len(out) == 0 {
			return nil
		}
	}
	return out
}
