package dev.changeling.project;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.xml.sax.ErrorHandler;
import org.xml.sax.SAXException;
import org.xml.sax.SAXParseException;

/** Reading POM files: a safe parser (no doctypes, no entities) and the few ways of walking elements they need. */
final class XmlElements {

    private XmlElements() {
    }

    /** The root element of an XML file; a parse error is thrown, not also printed. */
    static Element root(Path file) throws IOException, SAXException {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            factory.setExpandEntityReferences(false);
            DocumentBuilder builder = factory.newDocumentBuilder();
            builder.setErrorHandler(new QuietErrors());
            return builder.parse(file.toFile()).getDocumentElement();
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException(e);
        }
    }

    static Optional<Element> child(Element parent, String name) {
        return children(parent, name).stream().findFirst();
    }

    static List<Element> children(Element parent, String name) {
        return children(parent).stream().filter(element -> element.getTagName().equals(name)).toList();
    }

    static List<Element> children(Element parent) {
        List<Element> elements = new ArrayList<>();
        for (Node node = parent.getFirstChild(); node != null; node = node.getNextSibling()) {
            if (node instanceof Element element) {
                elements.add(element);
            }
        }
        return elements;
    }

    static String text(Element element) {
        return element.getTextContent().strip();
    }

    /** Lets a parse error become the exception the caller reports, instead of also being printed to stderr. */
    private static final class QuietErrors implements ErrorHandler {

        @Override
        public void warning(SAXParseException exception) {
        }

        @Override
        public void error(SAXParseException exception) throws SAXParseException {
            throw exception;
        }

        @Override
        public void fatalError(SAXParseException exception) throws SAXParseException {
            throw exception;
        }
    }
}
