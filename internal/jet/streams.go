package jet

import "math"

// SeparateStreams returns the two streams of coaxial nozzle n at c, each as
// a single jet leaving alone into still air: the primary from a convergent
// nozzle of the primary diameter, the secondary from a convergent round
// nozzle of the annulus's area (diameter sqrt(4·A_s/π)), each at its own
// total pressure and temperature. Noise prediction uses them to bound a
// coaxial jet from above, where the mixed jet of [ExitState] is a lower
// bound. It returns an error when c does not fit n or n is not coaxial.
func SeparateStreams(n Nozzle, c Condition) (pn Nozzle, pc Condition, sn Nozzle, sc Condition, err error) {
	if err := c.Validate(n); err != nil {
		return Nozzle{}, Condition{}, Nozzle{}, Condition{}, err
	}
	if n.Kind != Coaxial {
		return Nozzle{}, Condition{}, Nozzle{}, Condition{}, &InputError{Field: "nozzle", Reason: "has one stream: only a coaxial nozzle has two"}
	}
	pn = Nozzle{Kind: Convergent, Contour: n.Contour, Diameter: n.Diameter}
	sn = Nozzle{Kind: Convergent, Contour: n.Contour, Diameter: math.Sqrt(4 * n.SecondaryArea() / math.Pi)}
	pc = Condition{Name: c.Name, Primary: c.Primary, Ambient: c.Ambient}
	sc = Condition{Name: c.Name, Primary: *c.Secondary, Ambient: c.Ambient}
	return pn, pc, sn, sc, nil
}

// StreamExits returns the fully expanded exit states of the two streams of
// coaxial nozzle n at c, each alone ([SeparateStreams]).
func StreamExits(n Nozzle, c Condition) (primary, secondary Exit, err error) {
	pn, pc, sn, sc, err := SeparateStreams(n, c)
	if err != nil {
		return Exit{}, Exit{}, err
	}
	if primary, err = ExitState(pn, pc); err != nil {
		return Exit{}, Exit{}, err
	}
	if secondary, err = ExitState(sn, sc); err != nil {
		return Exit{}, Exit{}, err
	}
	return primary, secondary, nil
}
