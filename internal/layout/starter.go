package layout

import _ "embed" // for the starter layout

//go:embed starter.yaml
var starter []byte

// Starter returns the commented starter layout that `arcwright init` writes:
// a complete, valid layout set in an imaginary facility of our own, with
// every key explained in a comment and the unit shown on every quantity.
// The slice is new on each call.
func Starter() []byte { return append([]byte(nil), starter...) }
