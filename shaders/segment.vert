#version 330 core
// One instance per segment (member, grid line, arrow part): a 4-vertex triangle strip widened
// in screen space. Must match tetrapod.view.SegmentQuad, which does the same in Java.
layout(location = 0) in vec3 aStart;     // world, m
layout(location = 1) in vec3 aEnd;       // world, m
layout(location = 2) in vec3 aColour;    // sRGB
layout(location = 3) in vec2 aWidths;    // reference px at start and end
layout(location = 4) in float aCaps;     // 1: extend each end by half its width

uniform mat4 uViewProjection;
uniform vec2 uViewport;       // px
uniform float uPixelScale;    // px per reference px

out vec3 vColour;

void main() {
    vec4 c0 = uViewProjection * vec4(aStart, 1.0);
    vec4 c1 = uViewProjection * vec4(aEnd, 1.0);
    vec2 halfViewport = 0.5 * uViewport;
    vec2 s0 = c0.xy / c0.w * halfViewport;
    vec2 s1 = c1.xy / c1.w * halfViewport;
    vec2 d = s1 - s0;
    float len = length(d);
    vec2 dir = len > 1e-6 ? d / len : vec2(1.0, 0.0);
    vec2 normal = vec2(-dir.y, dir.x);
    bool atEnd = gl_VertexID >= 2;
    float side = (gl_VertexID & 1) == 0 ? -1.0 : 1.0;
    float w = 0.5 * uPixelScale * (atEnd ? aWidths.y : aWidths.x);
    vec4 c = atEnd ? c1 : c0;
    vec2 offset = normal * side * w + dir * (atEnd ? 1.0 : -1.0) * w * aCaps;
    c.xy += offset / halfViewport * c.w;
    gl_Position = c;
    vColour = aColour;
}
