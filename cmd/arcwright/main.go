// Command arcwright plans microphone stations around a jet exhaust for an
// acoustic test and writes a floor layout sheet. Run "arcwright help".
package main

import "os"

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}
