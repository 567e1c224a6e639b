#version 330 core
in vec2 vUv;
uniform sampler2D uAtlas;
out vec4 fragColour;

void main() {
    fragColour = texture(uAtlas, vUv);
}
