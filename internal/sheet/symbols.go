package sheet

import "math"

// floorMarks draws each floor mark as a small cross.
func (v *planView) floorMarks() {
	for _, m := range v.b.req.Cell.Marks {
		p := v.t.pt(m.At[0], m.At[1])
		const a = 1.4
		v.shapes = append(v.shapes, line(StyleTick, Pt{p.X - a, p.Y}, Pt{p.X + a, p.Y}), line(StyleTick, Pt{p.X, p.Y - a}, Pt{p.X, p.Y + a}))
		v.pl.block(rectAround(p, a))
	}
}

// datum draws the datum symbol at (0, 0) with short X and Y arrows.
func (v *planView) datum() {
	p := v.t.pt(0, 0)
	const r = 2.0
	// the symbol, its arrows and their letters must lie inside the frame;
	// a datum outside the view (a cropped site) is said in the notes
	if !v.frame.inset(1).Contains(Rect{p.X - r - 1, p.Y - r - 11, 2*r + 12, 2*r + 12}) {
		v.datumOut = true
		v.notes = append(v.notes, "The datum (0, 0) lies outside this view: the grid figures still measure from it.")
		return
	}
	v.shapes = append(v.shapes, datumSymbol(p, r)...)
	v.shapes = append(v.shapes, arrow(StyleTick, add(p, Pt{r, 0}), add(p, Pt{r + 7, 0}), 1.2)...)
	v.shapes = append(v.shapes, arrow(StyleTick, add(p, Pt{0, -r}), add(p, Pt{0, -r - 7}), 1.2)...)
	v.pl.block(rectAround(p, r+0.2))
	v.pl.block(Rect{p.X + r, p.Y - 0.8, 7.2, 1.6})
	v.pl.block(Rect{p.X - 0.8, p.Y - r - 7.2, 1.6, 7.2})
	sz := sizeSmall
	for _, a := range []struct {
		s  string
		at Pt
	}{{"X", Pt{p.X + r + 7.6, p.Y + capHeight(sz)/2}}, {"Y", Pt{p.X - v.b.m.width("Y", sz, true)/2, p.Y - r - 8}}} {
		w := v.b.m.width(a.s, sz, true)
		box := Rect{a.at.X - 0.2, a.at.Y - capHeight(sz) - 0.4, w + 0.4, capHeight(sz) + 0.8}
		v.pl.block(box)
		v.labels = append(v.labels, Label{Text: a.s, Kind: FeatureLabel, For: "datum axis", X: box.X, Y: box.Y, W: box.W, H: box.H, Size: sz, Anchor: p, View: v.viewName()})
	}
}

// datumSymbol returns our datum symbol: a circle quartered by a cross with
// the upper-right and lower-left quarters filled.
func datumSymbol(p Pt, r float64) []Shape {
	q := func(a0 float64) []Pt {
		pts := []Pt{p}
		for i := 0; i <= 8; i++ {
			a := a0 + float64(i)*math.Pi/16
			pts = append(pts, Pt{p.X + r*math.Cos(a), p.Y - r*math.Sin(a)})
		}
		return pts
	}
	return []Shape{
		circle(StyleMark, p, r),
		poly(StyleSolid, q(0)),
		poly(StyleSolid, q(math.Pi)),
		line(StyleTick, Pt{p.X - r*1.4, p.Y}, Pt{p.X + r*1.4, p.Y}),
		line(StyleTick, Pt{p.X, p.Y - r*1.4}, Pt{p.X, p.Y + r*1.4}),
	}
}

// arrow returns a line from a to b with a filled head of length head (mm)
// at b.
func arrow(s Style, a, b Pt, head float64) []Shape {
	d := unit(sub(b, a), Pt{1, 0})
	n := perp(d)
	base := sub(b, mul(d, head))
	return []Shape{
		line(s, a, base),
		poly(StyleSolid, []Pt{b, add(base, mul(n, head*0.35)), sub(base, mul(n, head*0.35))}),
	}
}

// reference draws the reference arrows (plan X and Y, and the jet flow
// along the nozzle axis) in the corner of the frame with the least drawn on
// it.
func (v *planView) reference() {
	const w, h = 33.0, 21.0
	in := v.frame.inset(1.5)
	corners := []Rect{
		{in.Right() - w, in.Y, w, h},
		{in.X + 9, in.Y, w, h},
		{in.Right() - w, in.Bottom() - h - 6, w, h},
		{in.X + 9, in.Bottom() - h - 6, w, h},
	}
	best, bestN := corners[0], math.MaxInt
	for _, c := range corners {
		n := v.pl.boxesOver(c)
		for _, p := range v.pos {
			if p.X >= c.X && p.X <= c.Right() && p.Y >= c.Y && p.Y <= c.Bottom() {
				n += 3
			}
		}
		if n < bestN {
			best, bestN = c, n
		}
	}
	r := best
	v.shapes = append(v.shapes, rectShape(StyleWhite, r), rectShape(StyleBox, r))
	o := Pt{r.X + 4, r.Bottom() - 4.5}
	v.shapes = append(v.shapes, arrow(StyleTick, o, add(o, Pt{9, 0}), 1.2)...)
	v.shapes = append(v.shapes, arrow(StyleTick, o, add(o, Pt{0, -9}), 1.2)...)
	s, c := math.Sincos(v.b.req.Exit.Heading)
	jc := Pt{r.X + 23, r.Y + h/2 + 0.5}
	d := Pt{c, -s}
	v.shapes = append(v.shapes, arrow(StyleTick, sub(jc, mul(d, 5)), add(jc, mul(d, 5)), 1.6)...)
	v.pl.block(r)
	sz := sizeSmall
	jw := v.b.m.width("jet flow", sz, false)
	v.refTexts = []Text{
		v.b.text(o.X+9.8, o.Y+capHeight(sz)/2, sz, true, "X"),
		v.b.text(o.X+1.2, o.Y-8, sz, true, "Y"),
		v.b.text(jc.X-jw/2, r.Bottom()-1.6, sz, false, "jet flow"),
		v.b.text(r.X+1.5, r.Y+2.4, 4.2, false, "plan, seen from above"),
	}
}
