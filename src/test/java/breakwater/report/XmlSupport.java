package breakwater.report;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import org.xml.sax.InputSource;

/** Parses markup with the JDK's own XML parser (namespace-aware, no external entities or DTDs fetched). */
public final class XmlSupport {
    static final String XHTML = "http://www.w3.org/1999/xhtml";
    public static final String SVG = "http://www.w3.org/2000/svg";

    private XmlSupport() {
    }

    public static Document parse(String xml) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setExpandEntityReferences(false);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setFeature("http://xml.org/sax/features/external-general-entities", false);
        DocumentBuilder b = f.newDocumentBuilder();
        b.setErrorHandler(null);
        return b.parse(new InputSource(new StringReader(xml)));
    }

    static List<Element> elements(Node root, String namespace, String localName) {
        NodeList list = root instanceof Document d ? d.getElementsByTagNameNS(namespace, localName)
                : ((Element) root).getElementsByTagNameNS(namespace, localName);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            out.add((Element) list.item(i));
        }
        return out;
    }

    /** The XHTML element with the given id attribute. */
    static Element byId(Document d, String localName, String id) {
        return elements(d, XHTML, localName).stream().filter(e -> id.equals(e.getAttribute("id"))).findFirst()
                .orElseThrow(() -> new AssertionError("no <" + localName + " id=\"" + id + "\">"));
    }

    /** Text content of every SVG text element, in document order. */
    public static List<String> svgTexts(Node root) {
        return elements(root, SVG, "text").stream().map(e -> e.getTextContent().strip()).toList();
    }
}
