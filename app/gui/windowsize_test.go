package gui

import "testing"

// TestWindowFitsSmallScreens: the window opens smaller than a 1280×800
// screen (room for a title bar and a panel) and can be made as small as
// 1024×700.
func TestWindowFitsSmallScreens(t *testing.T) {
	h := newHarness(t)
	if defaultWindowSize.Width >= 1280 || defaultWindowSize.Height >= 800-40 {
		t.Errorf("the window opens at %v, not smaller than a 1280×800 screen with a title bar", defaultWindowSize)
	}
	min := h.w.Content().MinSize()
	if min.Width > 1024 || min.Height > 700 {
		t.Errorf("the smallest window is %.0f×%.0f, want at most 1024×700", min.Width, min.Height)
	}
}
