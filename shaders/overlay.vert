#version 330 core
// Labels and legend: textured quads in image pixels (origin top left, y down).
layout(location = 0) in vec2 aPixel;
layout(location = 1) in vec2 aUv;

uniform vec2 uViewport;  // px

out vec2 vUv;

void main() {
    vec2 ndc = vec2(aPixel.x / uViewport.x * 2.0 - 1.0, 1.0 - aPixel.y / uViewport.y * 2.0);
    gl_Position = vec4(ndc, 0.0, 1.0);
    vUv = aUv;
}
