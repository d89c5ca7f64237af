package sheet

// Style names how a shape is drawn: its pen, fill and hatching.
type Style string

// Styles. Areas differ by outline pattern and by hatch angle and spacing as
// well as colour, so a black-and-white print still tells them apart: the
// velocity zone sparse lines at 30° with a solid outline, the hot zone
// dense lines at −60° with a dashed outline, keep-out zones a square
// cross-hatch with a chain outline, the treatment fine grey lines at −45°,
// obstacles a plain grey fill.
const (
	StyleFrame      Style = "frame"         // sheet border
	StyleBox        Style = "box"           // panel and title-block lines
	StyleCaution    Style = "caution"       // the heavy border of the safety panel
	StyleSignal     Style = "signal"        // the signal-word band of the safety panel: safety orange fill
	StyleSignalMark Style = "signal.mark"   // the exclamation mark inside the safety alert symbol: safety orange fill
	StyleHazard     Style = "hazard"        // the warning triangle where a zone meets a surface: safety orange, black outline
	StyleDetail     Style = "detail"        // the outline of a detail view on the plan: long dash and two dots
	StyleGrid       Style = "grid"          // the light coordinate grid
	StyleBoundary   Style = "boundary"      // the cell boundary, thick
	StyleSiteLimit  Style = "sitelimit"     // an outdoor site limit: thick dashes (a line on the ground, not a wall)
	StyleTreatment  Style = "treatment"     // the treatment behind the boundary: thin, light hatching at −45°
	StyleObstacle   Style = "obstacle"      // obstacles: solid outline, grey fill
	StyleKeepOut    Style = "keepout"       // keep-out zones: chain outline, square cross-hatching
	StyleVelocity   Style = "zone.velocity" // velocity zone: solid outline, sparse hatching at 30°
	StyleHot        Style = "zone.hot"      // hot zone: dashed outline, dense hatching at −60°
	StyleMargin     Style = "zone.margin"   // the margin band around a zone: dotted
	StyleCore       Style = "zone.core"     // the potential core: a filled wedge
	StyleAxis       Style = "axis"          // centre lines: long dash and dot
	StyleNozzle     Style = "nozzle"        // the nozzle body: dark fill
	StyleCollector  Style = "collector"     // the exhaust collector
	StyleArray      Style = "array"         // array lines (arcs, lines, rings)
	StyleTick       Style = "tick"          // angle ticks and small crosses
	StyleDim        Style = "dim"           // dimension lines
	StyleLeader     Style = "leader"        // label leader lines
	StyleMark       Style = "mark"          // station symbols
	StyleStrike     Style = "strike"        // the heavy X of a blocked station
	StyleBase       Style = "base"          // a boom stand's base footprint and boom
	StyleSolid      Style = "solid"         // black fill, no outline (dots, arrowheads)
	StyleWhite      Style = "white"         // white fill, no outline (label backgrounds)
	StyleFloor      Style = "floor"         // the floor band of the elevation
	StylePole       Style = "pole"          // stand poles in elevation
	StyleSilhouette Style = "silhouette"    // obstacles projected into the elevation
	StyleRule       Style = "rule"          // table lines
	StyleHeadFill   Style = "headfill"      // table heading background
	StyleScaleFill  Style = "scalefill"     // black segments of the scale bar
	StyleNoiseA     Style = "noise.a"       // an A-weighted noise contour: brown long dashes
	StyleNoisePeak  Style = "noise.peak"    // the C-weighted peak contour: heavy magenta dash-dot
	StyleCrew       Style = "crew"          // a crew position: a yellow square
)

// RGB is a colour, each component 0–255.
type RGB [3]int

// Pen is how a line is stroked.
type Pen struct {
	Width float64   // mm; 0 means no outline
	Dash  []float64 // dash pattern, mm; nil for a solid line
	Round bool      // round caps (dots)
	Color RGB
}

// Hatch is a family of parallel lines filling a shape.
type Hatch struct {
	Angle   float64 // degrees from the page's +x axis, counter-clockwise as seen on the page
	Spacing float64 // mm between lines
	Pen     Pen
}

// StyleDef is the definition of a style.
type StyleDef struct {
	Pen     Pen
	Fill    *RGB // nil: not filled
	Hatches []Hatch
}

var (
	black    = RGB{0, 0, 0}
	white    = RGB{255, 255, 255}
	gridGrey = RGB{205, 205, 205}
	midGrey  = RGB{120, 120, 120}
	// leaderGrey is dark enough that a thin leader still shows on a grey
	// print
	leaderGrey = RGB{60, 60, 60}
	lightFill  = RGB{228, 228, 228}
	coreFill   = RGB{150, 150, 150}
	velBlue    = RGB{30, 80, 170}
	hotRed     = RGB{190, 45, 20}
	keepPlum   = RGB{110, 50, 120}
	arrayTeal  = RGB{0, 110, 100}
	headFill   = RGB{235, 235, 235}
	// safetyOrange approximates the safety orange of ANSI Z535.1, the
	// colour of the WARNING signal word panel (FROM MEMORY)
	safetyOrange = RGB{245, 120, 20}
	noiseAmb     = RGB{140, 80, 20} // brown: apart from the safety orange of the hazards
	crewYellow   = RGB{250, 215, 0}
	noiseMag     = RGB{170, 0, 120}
)

func fill(c RGB) *RGB { return &c }

var styles = map[Style]StyleDef{
	StyleNoiseA:     {Pen: Pen{Width: 0.35, Dash: []float64{4, 1.2}, Color: noiseAmb}},
	StyleNoisePeak:  {Pen: Pen{Width: 0.5, Dash: []float64{3, 0.8, 0.5, 0.8}, Color: noiseMag}},
	StyleCrew:       {Pen: Pen{Width: 0.3, Color: black}, Fill: fill(crewYellow)},
	StyleFrame:      {Pen: Pen{Width: 0.5, Color: black}},
	StyleBox:        {Pen: Pen{Width: 0.25, Color: black}},
	StyleCaution:    {Pen: Pen{Width: 0.8, Color: black}},
	StyleSignal:     {Fill: fill(safetyOrange)},
	StyleSignalMark: {Fill: fill(safetyOrange)},
	StyleHazard:     {Pen: Pen{Width: 0.25, Color: black}, Fill: fill(safetyOrange)},
	StyleDetail:     {Pen: Pen{Width: 0.3, Dash: []float64{5, 0.8, 0.5, 0.8, 0.5, 0.8}, Color: black}},
	StyleGrid:       {Pen: Pen{Width: 0.1, Color: gridGrey}},
	StyleBoundary:   {Pen: Pen{Width: 0.7, Color: black}},
	StyleSiteLimit:  {Pen: Pen{Width: 0.6, Dash: []float64{5, 1.5}, Color: black}},
	StyleTreatment:  {Pen: Pen{Width: 0.15, Color: midGrey}, Hatches: []Hatch{{Angle: -45, Spacing: 0.9, Pen: Pen{Width: 0.08, Color: midGrey}}}},
	StyleObstacle:   {Pen: Pen{Width: 0.35, Color: black}, Fill: fill(lightFill)},
	StyleKeepOut:    {Pen: Pen{Width: 0.3, Dash: []float64{3, 0.8, 0.4, 0.8}, Color: keepPlum}, Hatches: []Hatch{{Angle: 0, Spacing: 1.8, Pen: Pen{Width: 0.12, Color: keepPlum}}, {Angle: 90, Spacing: 1.8, Pen: Pen{Width: 0.12, Color: keepPlum}}}},
	StyleVelocity:   {Pen: Pen{Width: 0.35, Color: velBlue}, Hatches: []Hatch{{Angle: 30, Spacing: 2.5, Pen: Pen{Width: 0.12, Color: velBlue}}}},
	StyleHot:        {Pen: Pen{Width: 0.4, Dash: []float64{1.6, 0.8}, Color: hotRed}, Hatches: []Hatch{{Angle: -60, Spacing: 1.1, Pen: Pen{Width: 0.12, Color: hotRed}}}},
	StyleMargin:     {Pen: Pen{Width: 0.35, Dash: []float64{0, 0.9}, Round: true, Color: black}},
	StyleCore:       {Pen: Pen{Width: 0.1, Color: black}, Fill: fill(coreFill)},
	StyleAxis:       {Pen: Pen{Width: 0.18, Dash: []float64{6, 1, 0.6, 1}, Color: black}},
	StyleNozzle:     {Pen: Pen{Width: 0.25, Color: black}, Fill: fill(midGrey)},
	StyleCollector:  {Pen: Pen{Width: 0.45, Color: black}},
	StyleArray:      {Pen: Pen{Width: 0.2, Color: arrayTeal}},
	StyleTick:       {Pen: Pen{Width: 0.2, Color: black}},
	StyleDim:        {Pen: Pen{Width: 0.15, Color: black}},
	StyleLeader:     {Pen: Pen{Width: 0.15, Color: leaderGrey}},
	StyleMark:       {Pen: Pen{Width: 0.25, Color: black}, Fill: fill(white)},
	StyleStrike:     {Pen: Pen{Width: 0.5, Color: black}},
	StyleBase:       {Pen: Pen{Width: 0.15, Color: black}},
	StyleSolid:      {Fill: fill(black)},
	StyleWhite:      {Fill: fill(white)},
	StyleFloor:      {Hatches: []Hatch{{Angle: 45, Spacing: 1.2, Pen: Pen{Width: 0.1, Color: black}}}},
	StylePole:       {Pen: Pen{Width: 0.3, Color: black}},
	StyleSilhouette: {Pen: Pen{Width: 0.15, Dash: []float64{1, 0.6}, Color: midGrey}, Fill: fill(RGB{242, 242, 242})},
	StyleRule:       {Pen: Pen{Width: 0.1, Color: midGrey}},
	StyleHeadFill:   {Fill: fill(headFill)},
	StyleScaleFill:  {Pen: Pen{Width: 0.2, Color: black}, Fill: fill(black)},
}

// Def returns the definition of style s and whether s is defined.
func (s Style) Def() (StyleDef, bool) {
	d, ok := styles[s]
	return d, ok
}
