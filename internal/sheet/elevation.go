package sheet

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/spatial/r3"
)

// elevView is the elevation being drawn: the vertical plane through the jet
// axis, x along the axis (downstream to the right) and height up.
type elevView struct {
	b      *builder
	frame  Rect
	t      transform
	shapes []Shape
	labels []Label
	texts  []Text
	pl     *placer
	top    float64 // world height of the frame's top edge, m
}

// axial returns the axial position of p (cell frame), m from the exit plane.
func (b *builder) axial(p r3.Vec) float64 {
	fr := b.req.Exit
	return r3.Dot(r3.Sub(p, fr.Exit), fr.Axis())
}

// elevExtent returns the axial range and the height range the elevation
// shows, m, and whether the ceiling is inside the height range. With
// withCeiling false, or a ceiling far above everything else, the view stops
// 0.5 m above the highest thing drawn.
func (b *builder) elevExtent(withCeiling bool) (u0, u1, top float64, ceiling bool) {
	c := &b.req.Cell
	fr := b.req.Exit
	u0, u1 = -nozzleLen(b.gov.Exit.Diameter)-0.3, 0.3
	hmax := fr.Exit.Z + 0.3
	ext := func(u float64) { u0, u1 = math.Min(u0, u), math.Max(u1, u) }
	for i := range b.plan.Stations {
		s := &b.plan.Stations[i]
		ext(s.Jet.X)
		ext(b.axial(r3.Vec{X: s.Base[0], Y: s.Base[1]}))
		hmax = math.Max(hmax, s.Height)
	}
	for _, o := range c.Obstacles {
		if finite(o.ZMax) {
			hmax = math.Max(hmax, o.ZMax)
		}
	}
	if col := c.Collector; col != nil {
		ext(b.axial(col.Inlet))
		hmax = math.Max(hmax, col.Inlet.Z+col.Diameter/2)
	}
	if c.Bounded() {
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, p := range c.Boundary {
			u := b.axial(r3.Vec{X: p[0], Y: p[1]})
			lo, hi = math.Min(lo, u), math.Max(hi, u)
		}
		u0, u1 = math.Min(u0, lo-c.TreatmentDepth), math.Max(u1, hi+c.TreatmentDepth)
	} else {
		pad := math.Max(1, 0.05*(u1-u0))
		u0, u1 = u0-pad, u1+pad
	}
	top = hmax + 0.5
	if withCeiling && finite(c.Ceiling) && c.Ceiling <= 2*hmax+2 {
		top, ceiling = math.Max(top, c.Ceiling+math.Min(c.TreatmentDepth, 1)+0.2), true
	}
	return u0, u1, top, ceiling
}

// elevationScale returns the scale the elevation takes in an area of
// w × maxH mm, and false if none fits.
func (b *builder) elevationScale(w, maxH float64) (int, bool) {
	_, _, _, scale, ok := b.elevationFit(w, maxH)
	return scale, ok
}

// elevationFit chooses the elevation's extent and scale for an area of
// w × maxH mm: the plan's scale with the ceiling, else the plan's scale
// without it, else the largest scale that shows the ceiling.
func (b *builder) elevationFit(w, maxH float64) (u0, u1 float64, top float64, scale int, ok bool) {
	aw, ah := w-2*viewPad, maxH-2*viewPad
	u0, u1, top, _ = b.elevExtent(true)
	scale = b.model.Scale
	if fits(u1-u0, top+floorBand, aw, ah, scale) {
		return u0, u1, top, scale, true
	}
	if a0, a1, t, _ := b.elevExtent(false); fits(a1-a0, t+floorBand, aw, ah, scale) {
		return a0, a1, t, scale, true
	}
	scale, ok = chooseScale(scalesFor(b.req.Units), u1-u0, top+floorBand, aw, ah)
	return u0, u1, top, scale, ok
}

// maxElevationIDs is the most stations whose IDs the elevation prints.
const maxElevationIDs = 80

// floorBand is the depth of floor drawn under the elevation, m.
const floorBand = 0.4

// elevation lays out the elevation in the area w × maxH mm at the flow's
// position and returns it with its height, or false when it fits at no
// standard scale.
func (b *builder) elevation(x, y, w, maxH float64) (*elevView, float64, bool) {
	const below = floorBand
	u0, u1, top, scale, ok := b.elevationFit(w, maxH)
	if !ok {
		return nil, 0, false
	}
	c := &b.req.Cell
	ceiling := finite(c.Ceiling) && c.Ceiling <= top
	ww, hh := u1-u0, top+below
	k := 1000 / float64(scale)
	h := hh*k + 2*viewPad
	w = math.Min(w, ww*k+2*viewPad)
	frame := Rect{x, y, w, h}
	v := &elevView{b: b, frame: frame, top: top}
	v.t = newTransform(scale, (u0+u1)/2, (top-below)/2, Pt{x + w/2, y + h/2})
	v.pl = newPlacer(frame.inset(0.8))
	b.model.ElevationScale = scale
	v.draw(ceiling)
	return v, h, true
}

// draw draws the elevation: grid, floor, ceiling or sky, the cell's ends,
// obstacles, collector, zones, nozzle and stands.
func (v *elevView) draw(ceiling bool) {
	b := v.b
	c := &b.req.Cell
	fr := b.req.Exit
	pr := b.pr
	t := v.t
	fx0, _ := t.world(Pt{v.frame.X, 0})
	fx1, _ := t.world(Pt{v.frame.Right(), 0})
	// grid of heights and axial distances
	g := gridSpacing(b.model.ElevationScale, b.req.Units, 15)
	_, ybot := t.world(Pt{0, v.frame.Bottom()})
	for j := math.Ceil(ybot / g); j*g <= v.top; j++ {
		p := t.pt(0, j*g)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{v.frame.X, p.Y}, Pt{v.frame.Right(), p.Y}))
		if j >= 0 && p.Y > v.frame.Y+3 {
			s := trimNum(j * g / unitLen(b.req.Units))
			v.fixedLabel(s, Pt{v.frame.X + 0.8, p.Y - capHeight(sizeSmall)/2 - 0.4}, "grid height")
		}
	}
	for i := math.Ceil(fx0 / g); i*g <= fx1; i++ {
		p := t.pt(i*g, 0)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{p.X, v.frame.Y}, Pt{p.X, v.frame.Bottom()}))
		s := trimNum(i * g / unitLen(b.req.Units))
		wd := b.m.width(s, sizeSmall, false)
		if p.X-wd/2 > v.frame.X+8 && p.X+wd/2 < v.frame.Right()-2 {
			v.fixedLabel(s, Pt{p.X - wd/2 - 0.3, v.frame.Bottom() - capHeight(sizeSmall) - 1.6}, "grid x")
		}
	}
	// floor
	fl := []Pt{t.pt(fx0-1, 0), t.pt(fx1+1, 0), t.pt(fx1+1, -0.4), t.pt(fx0-1, -0.4)}
	v.shapes = append(v.shapes, poly(StyleFloor, fl), line(StyleBoundary, t.pt(fx0-1, 0), t.pt(fx1+1, 0)))
	// ceiling or open sky
	if ceiling {
		v.shapes = append(v.shapes, line(StyleBoundary, t.pt(fx0-1, c.Ceiling), t.pt(fx1+1, c.Ceiling)))
		if c.TreatmentDepth > 0 {
			band := []Pt{t.pt(fx0-1, c.Ceiling), t.pt(fx1+1, c.Ceiling), t.pt(fx1+1, c.Ceiling+c.TreatmentDepth), t.pt(fx0-1, c.Ceiling+c.TreatmentDepth)}
			v.shapes = append(v.shapes, poly(StyleTreatment, band))
		}
	}
	// the cell's extreme ends along the axis
	if c.Bounded() {
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, p := range c.Boundary {
			u := b.axial(r3.Vec{X: p[0], Y: p[1]})
			lo, hi = math.Min(lo, u), math.Max(hi, u)
		}
		topWall := v.top
		if ceiling {
			topWall = c.Ceiling
		}
		for _, u := range []float64{lo, hi} {
			v.shapes = append(v.shapes, line(StyleBoundary, t.pt(u, 0), t.pt(u, topWall)))
		}
	}
	// obstacles, as silhouettes seen from the side
	for _, o := range c.Obstacles {
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, p := range o.Footprint.Outline(32) {
			u := b.axial(r3.Vec{X: p[0], Y: p[1]})
			lo, hi = math.Min(lo, u), math.Max(hi, u)
		}
		z0, z1 := math.Max(o.ZMin, 0), math.Min(o.ZMax, v.top+1)
		if z1 > z0 {
			v.shapes = append(v.shapes, poly(StyleSilhouette, []Pt{t.pt(lo, z0), t.pt(hi, z0), t.pt(hi, z1), t.pt(lo, z1)}))
		}
	}
	if col := c.Collector; col != nil {
		u := b.axial(col.Inlet)
		r := col.Diameter / 2
		duct := math.Max(col.Diameter, 1)
		v.shapes = append(v.shapes,
			line(StyleCollector, t.pt(u, col.Inlet.Z-r), t.pt(u, col.Inlet.Z+r)),
			line(StyleBase, t.pt(u, col.Inlet.Z-r), t.pt(u+duct, col.Inlet.Z-r)),
			line(StyleBase, t.pt(u, col.Inlet.Z+r), t.pt(u+duct, col.Inlet.Z+r)))
	}
	v.zones(fr.Exit.Z)
	v.nozzle(fr.Exit.Z, fx1)
	v.stands()
	// captions inside the frame
	if !ceiling {
		what := "open sky"
		if finite(c.Ceiling) {
			what = "ceiling " + pr.length(c.Ceiling) + " above the floor, above this view"
		}
		v.fixedLabel(what, Pt{v.frame.X + 12, v.frame.Y + 1.5}, "ceiling")
	} else {
		p := t.pt(0, c.Ceiling)
		v.placeText(fmt.Sprintf("ceiling (%s) %s above the floor", c.Kind, pr.length(c.Ceiling)), p, Pt{0, 1}, 0.5, featFar, "ceiling")
	}
	e := t.pt(0, fr.Exit.Z)
	v.placeText("nozzle axis "+pr.length(fr.Exit.Z)+" above the floor", e, unit(Pt{-1, -1}, Pt{0, -1}), 1.5, featFar, "nozzle")
	v.placeText("floor", t.pt(fx0+(fx1-fx0)*0.03, 0), Pt{0.3, -1}, 0.3, nil, "floor")
}

// fixedLabel records a label at a fixed place (grid figures, captions).
func (v *elevView) fixedLabel(s string, at Pt, of string) {
	s = clean(s)
	w, h := v.b.labelBox(s, sizeSmall)
	r := Rect{at.X, at.Y, w, h}
	if !v.pl.free(r) {
		return
	}
	v.pl.take(r)
	v.labels = append(v.labels, Label{Text: s, Kind: FeatureLabel, For: of, X: r.X, Y: r.Y, W: r.W, H: r.H, Size: sizeSmall, Anchor: at, View: "elevation"})
}

// placeText places a label in the elevation, if there is room.
func (v *elevView) placeText(s string, anchor, dir Pt, clear float64, far []float64, of string) bool {
	s = clean(s)
	kind := FeatureLabel
	size := sizeSmall
	if of == "" {
		kind, of, size = StationLabel, s, sizeID
	}
	w, h := v.b.labelBox(s, size)
	sp, ok := v.pl.find(want{w: w, h: h, anchor: anchor, clear: clear, dir: dir}, far)
	if !ok {
		return false
	}
	v.pl.commit(sp)
	v.labels = append(v.labels, Label{Text: s, Kind: kind, For: of, X: sp.box.X, Y: sp.box.Y, W: sp.box.W, H: sp.box.H,
		Size: size, Anchor: anchor, Leader: sp.leader, Line: leaderLine(sp), View: "elevation"})
	return true
}

// zones draws the governing point's zones in side view, the outlines
// mirrored about the axis height z0.
func (v *elevView) zones(z0 float64) {
	z := v.b.zs
	pts := func(r [][2]float64) []Pt {
		out := make([]Pt, len(r))
		for i, p := range r {
			out[i] = v.t.pt(p[0], p[1])
		}
		return out
	}
	for _, o := range []zoneOutline{z.velM, z.hotM} {
		if o != nil {
			v.shapes = append(v.shapes, poly(StyleMargin, pts(sideRing(o, z0))))
		}
	}
	if z.vel != nil {
		v.shapes = append(v.shapes, poly(StyleVelocity, pts(sideRing(z.vel, z0))))
	}
	if z.hot != nil {
		v.shapes = append(v.shapes, poly(StyleHot, pts(sideRing(z.hot, z0))))
	}
	if z.core > 0 {
		v.shapes = append(v.shapes, poly(StyleCore, pts(sideRing(zoneOutline{{0, 0}, {0, z.exitR}, {z.core, 0}}, z0))))
	}
}

// nozzle draws the nozzle body and the axis.
func (v *elevView) nozzle(z0, fx1 float64) {
	d := math.Max(v.b.gov.Exit.Diameter, 1.2/v.t.k)
	l := nozzleLen(d)
	t := v.t
	body := []Pt{t.pt(0, z0+d/2), t.pt(-l, z0+0.8*d), t.pt(-l, z0-0.8*d), t.pt(0, z0-d/2)}
	v.shapes = append(v.shapes, poly(StyleNozzle, body), line(StyleAxis, t.pt(-l-0.5*d-2/t.k, z0), t.pt(fx1+1, z0)))
	v.pl.block(boundOf(body))
}

// stands draws each station seen from the side: the pole from the floor at
// the base's axial position, the boom to the microphone, and the
// microphone's symbol at its axial position and height.
func (v *elevView) stands() {
	b := v.b
	t := v.t
	st := b.plan.Stations
	pts := make([]Pt, len(st))
	for i := range st {
		s := &st[i]
		pts[i] = t.pt(s.Jet.X, s.Height)
		if s.Stand == nil {
			continue
		}
		ub := b.axial(r3.Vec{X: s.Base[0], Y: s.Base[1]})
		br := math.Max(s.Stand.BaseRadius, 0.5/t.k)
		v.shapes = append(v.shapes,
			line(StyleStrike, t.pt(ub-br, 0), t.pt(ub+br, 0)),
			line(StylePole, t.pt(ub, 0), t.pt(ub, s.Height)))
		if math.Abs(ub-s.Jet.X)*t.k > 0.2 {
			v.shapes = append(v.shapes, line(StyleBase, t.pt(ub, s.Height), pts[i]))
		}
	}
	r := math.Min(markRadius(pts), 0.9)
	for i := range st {
		v.shapes = append(v.shapes, markShapes(st[i].Status, pts[i], r)...)
		v.pl.block(rectAround(pts[i], r*1.15))
	}
	// with many stations the side view is a comb of poles: their IDs are
	// left to the plan and the table
	if len(st) > maxElevationIDs {
		return
	}
	for i := range st {
		v.placeText(st[i].ID, pts[i], Pt{0, -1}, r+0.2, []float64{2, 4}, "")
	}
}
